// Expo's Metro defaults, plus two asset types:
// - woff2: the typeface ships as Latin-subset woff2 files (a tenth of the TTFs);
// - wasm: the barcode decoder's WebAssembly (zxing-wasm/reader/zxing_reader.wasm) is copied into the web
//   export under a content-hashed name, and importing it gives its URL on the app's own origin
//   (components/scan/code-reader.ts).
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push('woff2', 'wasm');

module.exports = config;
