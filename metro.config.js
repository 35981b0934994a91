// Metro, as Expo sets it up, plus `.wasm` as an asset: the barcode decoder's WebAssembly
// (zxing-wasm/reader/zxing_reader.wasm) is then copied into the web export under a content-hashed name,
// and importing it gives its URL on the app's own origin (components/scan/code-reader.ts).
const { getDefaultConfig } = require('expo/metro-config');

const config = getDefaultConfig(__dirname);
config.resolver.assetExts.push('wasm');

module.exports = config;
