// Expo's Metro defaults, plus WOFF2 fonts as assets (the web app loads WOFF2 subsets), and zod
// with its English messages only.
const path = require('node:path');

const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push('woff2');

// zod 4 re-exports all of its fifty-odd message locales as `z.locales`, which Metro cannot leave
// out (about 275 KB of the bundle, 32 KB over the wire). The app never calls `z.locales` and its
// messages are its own or zod's default English, so the web bundle gets English alone.
const zodLocales = path.join('node_modules', 'zod', 'v4', 'locales', 'index.js');
config.resolver.resolveRequest = (context, moduleName, platform) => {
  const resolution = context.resolveRequest(context, moduleName, platform);
  if (resolution.type === 'sourceFile' && resolution.filePath.endsWith(zodLocales)) {
    return { type: 'sourceFile', filePath: path.join(__dirname, 'metro/zod-locales-english.js') };
  }
  return resolution;
};

module.exports = config;
