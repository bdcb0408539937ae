// Expo's Metro config, plus woff2 as an asset type: the web app's fonts are woff2 (assets/fonts).
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push('woff2');

module.exports = config;
