import fs from 'node:fs';
import bwipjs from 'bwip-js';
import { PNG } from 'pngjs';

// Drum-label barcodes made by a well-known generator (bwip-js, Barcode Writer in Pure PostScript), read
// back into pixels (pngjs), and written as a Y4M video for Chromium's fake camera.

export type LabelSymbology = 'gs1datamatrix' | 'gs1-128' | 'qrcode' | 'gs1qrcode';

export interface Pixels {
  width: number;
  height: number;
  /** RGBA, 4 bytes a pixel. */
  data: Uint8ClampedArray;
}

/**
 * A PNG of the code. GS1 symbologies take the bracketed form "(01)…(10)…" and put FNC1 where GS1 needs it.
 * `dontlint` lets a wrong check digit or an impossible date through, as a badly printed label would.
 */
export async function barcodePng(bcid: LabelSymbology, text: string, options: { dontlint?: boolean; scale?: number } = {}): Promise<Buffer> {
  return bwipjs.toBuffer({
    bcid,
    text,
    scale: options.scale ?? 4,
    // The quiet zone: a decoder needs white around the symbol.
    paddingwidth: 12,
    paddingheight: 12,
    backgroundcolor: 'FFFFFF',
    ...(bcid === 'gs1-128' ? { height: 16, includetext: false } : {}),
    ...(options.dontlint ? { dontlint: true } : {}),
  });
}

export function pngPixels(png: Buffer): Pixels {
  const img = PNG.sync.read(png);
  return { width: img.width, height: img.height, data: new Uint8ClampedArray(img.data.buffer, img.data.byteOffset, img.data.length) };
}

/** As the browser's ImageData, for decoders that want one. */
export const asImageData = (p: Pixels) => ({ ...p, colorSpace: 'srgb' as const }) as unknown as ImageData;

/** The code centred on a white page of `width` × `height`: the quiet zone and the background a camera or photo sees. */
export function onPage(code: Pixels, width: number, height: number): Pixels {
  if (code.width > width || code.height > height) throw new Error(`the code (${code.width}×${code.height}) does not fit on ${width}×${height}`);
  const data = new Uint8ClampedArray(width * height * 4).fill(255);
  const left = Math.floor((width - code.width) / 2);
  const top = Math.floor((height - code.height) / 2);
  for (let row = 0; row < code.height; row += 1) {
    for (let col = 0; col < code.width; col += 1) {
      const from = (row * code.width + col) * 4;
      const to = ((top + row) * width + left + col) * 4;
      const alpha = code.data[from + 3] / 255; // over white where the PNG is transparent
      for (let c = 0; c < 3; c += 1) data[to + c] = Math.round(code.data[from + c] * alpha + 255 * (1 - alpha));
    }
  }
  return { width, height, data };
}

export function toPng(p: Pixels): Buffer {
  const png = new PNG({ width: p.width, height: p.height });
  png.data = Buffer.from(p.data.buffer, p.data.byteOffset, p.data.length);
  return PNG.sync.write(png);
}

/**
 * A Y4M file (YUV4MPEG2, 4:2:0, full-range BT.601 as C420jpeg says) of `frames` identical frames, for
 * Chromium's --use-file-for-fake-video-capture. Sizes must be even (4:2:0 halves both for chroma).
 */
export function writeY4m(file: string, frame: Pixels, frames = 2): void {
  const { width: w, height: h, data } = frame;
  if (w % 2 || h % 2) throw new Error(`a 4:2:0 frame needs even sizes, not ${w}×${h}`);
  const y = Buffer.alloc(w * h);
  for (let i = 0; i < w * h; i += 1) y[i] = Math.round(0.299 * data[i * 4] + 0.587 * data[i * 4 + 1] + 0.114 * data[i * 4 + 2]);
  // Black and white only: both chroma planes are neutral.
  const chroma = Buffer.alloc((w / 2) * (h / 2), 128);
  const parts: Buffer[] = [Buffer.from(`YUV4MPEG2 W${w} H${h} F25:1 Ip A1:1 C420jpeg\n`)];
  for (let f = 0; f < frames; f += 1) parts.push(Buffer.from('FRAME\n'), y, chroma, chroma);
  fs.writeFileSync(file, Buffer.concat(parts));
}
