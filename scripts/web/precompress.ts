import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { COMPRESS_THRESHOLD_BYTES, COMPRESSIBLE_EXTENSIONS } from '../../shared/web-delivery';

function* filesUnder(dir: string): Generator<string> {
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const p = path.join(dir, entry.name);
    if (entry.isDirectory()) yield* filesUnder(p);
    else yield p;
  }
}

/**
 * Writes `x.br` (brotli, best quality) and `x.gz` (gzip -9) beside each compressible file of an export,
 * once at build time instead of on every request; the server (express-static-gzip) picks the one the
 * browser accepts. A twin that saves nothing is not written.
 */
export function precompress(dir: string): { files: number; bytes: number; brotliBytes: number } {
  const totals = { files: 0, bytes: 0, brotliBytes: 0 };
  for (const file of [...filesUnder(dir)]) {
    if (!COMPRESSIBLE_EXTENSIONS.includes(path.extname(file).toLowerCase())) continue;
    const raw = fs.readFileSync(file);
    if (raw.length < COMPRESS_THRESHOLD_BYTES) continue;
    const br = zlib.brotliCompressSync(raw, {
      params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: raw.length },
    });
    const gz = zlib.gzipSync(raw, { level: 9 });
    if (br.length < raw.length) fs.writeFileSync(`${file}.br`, br);
    if (gz.length < raw.length) fs.writeFileSync(`${file}.gz`, gz);
    totals.files += 1;
    totals.bytes += raw.length;
    totals.brotliBytes += Math.min(br.length, raw.length);
  }
  return totals;
}
