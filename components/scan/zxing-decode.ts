// The app's own barcode decoding through ZXing-C++ compiled to WebAssembly (zxing-wasm), kept free of
// the browser and of Metro so that Node tests feed it the same images the browser does.
import type { ReaderOptions, ReadResult } from 'zxing-wasm/reader';

/** What drum labels carry: GS1 DataMatrix, GS1-128 (Code 128 with FNC1), and QR codes. */
export const LABEL_FORMATS = ['DataMatrix', 'Code128', 'QRCode'] as const;

export const READER_OPTIONS: ReaderOptions = {
  formats: [...LABEL_FORMATS],
  // Plain text keeps FNC1 separators as ASCII 29; the symbology identifier (]d2, ]C1, ]Q3) is prepended
  // below, so the GS1 parser sees exactly what the symbol holds rather than ZXing's bracketed rendering.
  textMode: 'Plain',
  tryHarder: true,
  tryRotate: true,
  tryInvert: true,
  maxNumberOfSymbols: 4,
};

/** One decoded symbol: its text with the symbology identifier in front when the decoder knows it. */
export interface DecodedCode {
  text: string;
  format: string;
}

type ReadBarcodes = (input: Blob | ArrayBuffer | Uint8Array | ImageData, options?: ReaderOptions) => Promise<ReadResult[]>;

/** The symbols ZXing finds in an image, valid ones only, as the GS1 parser wants them. */
export async function decodeWithZxing(readBarcodes: ReadBarcodes, image: ImageData | Blob | Uint8Array): Promise<DecodedCode[]> {
  const results = await readBarcodes(image, READER_OPTIONS);
  return results.filter((r) => r.isValid).map((r) => ({ text: `${r.symbologyIdentifier}${r.text}`, format: r.format }));
}
