// Reads barcodes from camera frames and photos: the browser's own BarcodeDetector where it reads all
// three label formats, the app's ZXing WebAssembly decoder everywhere else. Loaded with the scanner only.
import { prepareZXingModule, readBarcodes, type ZXingModuleOverrides } from 'zxing-wasm/reader';
// Metro treats .wasm as an asset (metro.config.js): this is its content-hashed URL on the app's own
// origin. zxing-wasm would otherwise fetch the file from a public CDN, which the plant network blocks.
import wasmUrl from 'zxing-wasm/reader/zxing_reader.wasm';
import { decodeWithZxing, type DecodedCode } from './zxing-decode';

const OVERRIDES: ZXingModuleOverrides = {
  locateFile: (path: string, prefix: string) => (path.endsWith('.wasm') ? wasmUrl : prefix + path),
};

/** BarcodeDetector format names (Shape Detection API) for the three label formats. */
const NATIVE_FORMATS = ['data_matrix', 'code_128', 'qr_code'];

interface NativeDetector {
  detect(source: CanvasImageSource | ImageBitmap): Promise<Array<{ rawValue: string; format: string }>>;
}
interface NativeDetectorClass {
  new (options: { formats: string[] }): NativeDetector;
  getSupportedFormats(): Promise<string[]>;
}

export type FrameSource = HTMLVideoElement | ImageBitmap;

export interface CodeReader {
  /** 'browser' for the built-in BarcodeDetector, 'app' for the app's own decoder. */
  engine: 'browser' | 'app';
  read(source: FrameSource): Promise<DecodedCode[]>;
}

/** Frames and photos are scaled down to this longest side: enough for a label, quick on a phone. */
const MAX_SIDE = 1600;

async function nativeReader(): Promise<CodeReader | null> {
  const Detector = (globalThis as { BarcodeDetector?: NativeDetectorClass }).BarcodeDetector;
  if (!Detector?.getSupportedFormats) return null;
  try {
    const supported = await Detector.getSupportedFormats();
    if (!NATIVE_FORMATS.every((f) => supported.includes(f))) return null;
    const detector = new Detector({ formats: NATIVE_FORMATS });
    // No symbology identifier from this API: the GS1 parser recognises GS1 data by its separators and GTIN.
    return { engine: 'browser', read: async (source) => (await detector.detect(source)).map((c) => ({ text: c.rawValue, format: c.format })) };
  } catch {
    return null;
  }
}

function sizeOf(source: FrameSource): { width: number; height: number } {
  return 'videoWidth' in source ? { width: source.videoWidth, height: source.videoHeight } : { width: source.width, height: source.height };
}

function appReader(): CodeReader {
  const canvas = document.createElement('canvas');
  const context = canvas.getContext('2d', { willReadFrequently: true });
  return {
    engine: 'app',
    read: async (source) => {
      const { width, height } = sizeOf(source);
      if (!context || width === 0 || height === 0) return [];
      const scale = Math.min(1, MAX_SIDE / Math.max(width, height));
      canvas.width = Math.round(width * scale);
      canvas.height = Math.round(height * scale);
      context.drawImage(source, 0, 0, canvas.width, canvas.height);
      return decodeWithZxing(readBarcodes, context.getImageData(0, 0, canvas.width, canvas.height));
    },
  };
}

/** The reader for this browser; the app's decoder has its WebAssembly fetched and compiled before this returns. */
export async function openCodeReader(): Promise<CodeReader> {
  const native = await nativeReader();
  if (native) return native;
  await prepareZXingModule({ overrides: OVERRIDES, fireImmediately: true });
  return appReader();
}
