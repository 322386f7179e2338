// Expo's Metro defaults, plus WOFF2 fonts as assets (the web app loads WOFF2 subsets).
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push('woff2');

module.exports = config;
