// Expo's Metro defaults, plus woff2: the typeface ships as Latin-subset woff2 files (a tenth of the TTFs).
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push('woff2');

module.exports = config;
