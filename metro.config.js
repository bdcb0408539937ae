// Expo's Metro config, plus woff2 as an asset type: the web app's fonts are woff2 (assets/fonts).
const path = require('node:path');
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push('woff2');

// Parts of zod the app never uses become the small modules in lib/zod-stand-ins/ (the same names), so the
// first screen does not carry them: every locale but English (~40 KB compressed), the ahead-of-time
// compiler and the JSON Schema reader. zod reaches them from its core and classic modules whatever we import.
const zodModule = (file) => new RegExp(`[\\\\/]node_modules[\\\\/]zod[\\\\/]v4[\\\\/]${file}\\.c?js$`);
const STAND_INS = [
  [zodModule('locales[\\\\/]index'), 'locales.ts'],
  [zodModule('core[\\\\/]compile'), 'compile.ts'],
  [zodModule('classic[\\\\/]from-json-schema'), 'from-json-schema.ts'],
].map(([test, file]) => [test, path.join(__dirname, 'lib', 'zod-stand-ins', file)]);
const upstream = config.resolver.resolveRequest;
config.resolver.resolveRequest = (context, moduleName, platform) => {
  const resolved = (upstream ?? context.resolveRequest)(context, moduleName, platform);
  if (resolved.type !== 'sourceFile') return resolved;
  const standIn = STAND_INS.find(([test]) => test.test(resolved.filePath));
  return standIn ? { type: 'sourceFile', filePath: standIn[1] } : resolved;
};

module.exports = config;
