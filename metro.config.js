// Expo's Metro config, plus woff2 as an asset type: the web app's fonts are woff2 (assets/fonts).
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push('woff2');

// zod's list of every locale (reached from zod's core and classic modules) becomes lib/zod-locales.ts,
// which has English only: the app never uses another, and the first screen would carry them all.
const ZOD_LOCALES = /[\\/]node_modules[\\/]zod[\\/]v4[\\/]locales[\\/]index\.c?js$/;
const englishOnly = path.join(__dirname, 'lib', 'zod-locales.ts');
const upstream = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  const resolved = (upstream ?? context.resolveRequest)(context, moduleName, platform);
  return resolved.type === 'sourceFile' && ZOD_LOCALES.test(resolved.filePath) ? { type: 'sourceFile', filePath: englishOnly } : resolved;
};

module.exports = config;
