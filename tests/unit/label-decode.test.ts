import fs from 'node:fs';
import { prepareZXingModule, readBarcodes } from 'zxing-wasm/reader';
import { decodeWithZxing } from '../../components/scan/zxing-decode';
import { parseDrumLabel } from '../../shared/gs1';
import { asImageData, barcodePng, pngPixels, type LabelSymbology } from '../support/barcodes';

// Barcodes made by a well-known generator (bwip-js) are read back by the app's decoder (zxing-wasm, the
// same module and options the browser uses) and then by the GS1 parser: the whole path from pixels to a
// lot number, without a browser. The WebAssembly comes from node_modules, as the web export's copy does.
const TODAY = new Date(Date.UTC(2026, 11, 2));
const GTIN = '09506000134352'; // GS1's example GTIN; check digit 2 (see gs1-label.test.ts)

beforeAll(() => {
  const wasm = fs.readFileSync(require.resolve('zxing-wasm/reader/zxing_reader.wasm'));
  prepareZXingModule({ overrides: { wasmBinary: wasm.buffer.slice(wasm.byteOffset, wasm.byteOffset + wasm.byteLength) as ArrayBuffer } });
});

async function scan(bcid: LabelSymbology, text: string, dontlint = false) {
  const codes = await decodeWithZxing(readBarcodes, asImageData(pngPixels(await barcodePng(bcid, text, { dontlint }))));
  expect(codes).toHaveLength(1);
  return { code: codes[0], label: parseDrumLabel(codes[0].text, TODAY) };
}

describe('decoding drum-label barcodes with the app decoder', () => {
  it('GS1 DataMatrix: ]d2, the separator after the batch kept, every field read', async () => {
    const { code, label } = await scan('gs1datamatrix', `(01)${GTIN}(11)261114(17)270500(10)LOT-4711(21)S99`);
    // ISO/IEC 15424: ]d2 is Data Matrix with FNC1 in the first position (GS1 DataMatrix).
    expect(code).toEqual({ format: 'DataMatrix', text: `]d201${GTIN}112611141727050010LOT-4711\u001d21S99` });
    expect(label).toEqual({ ok: true, kind: 'gs1', gtin: GTIN, batch: 'LOT-4711', productionDate: '2026-11-14', expiryDate: '2027-05-31', serial: 'S99' });
  });

  it('GS1-128 (Code 128 with FNC1): ]C1, the batch before the date ended by FNC1', async () => {
    const { code, label } = await scan('gs1-128', `(01)${GTIN}(10)AB12(17)270200`);
    expect(code.format).toBe('Code128');
    expect(code.text).toBe(`]C101${GTIN}10AB12\u001d17270200`);
    // GS1 General Specifications §3.4.7: day 00 = last day of month
    expect(label).toMatchObject({ ok: true, gtin: GTIN, batch: 'AB12', expiryDate: '2027-02-28' });
  });

  it('GS1 QR Code: ]Q3', async () => {
    const { code, label } = await scan('gs1qrcode', `(01)${GTIN}(10)Q-77(17)280200`);
    expect(code.text.startsWith(']Q3')).toBe(true);
    expect(label).toMatchObject({ ok: true, batch: 'Q-77', expiryDate: '2028-02-29' });
  });

  it('a plain QR code is the lot number as it is', async () => {
    const { code, label } = await scan('qrcode', 'LR-26-3101');
    expect(code).toEqual({ format: 'QRCode', text: ']Q1LR-26-3101' });
    expect(label).toMatchObject({ ok: true, kind: 'text', batch: 'LR-26-3101', gtin: null });
  });

  it('a label printed with a wrong GTIN check digit decodes, and the parser refuses it', async () => {
    const { label } = await scan('gs1datamatrix', '(01)09506000134359(10)LOT-4711', true);
    expect(label).toEqual({ ok: false, error: expect.stringMatching(/GTIN \(01\) 09506000134359 fails its check digit/) });
  });

  it('a label printed with an impossible expiry date decodes, and the parser refuses it', async () => {
    const { label } = await scan('gs1datamatrix', `(01)${GTIN}(17)270231(10)LOT-4711`, true);
    expect(label).toEqual({ ok: false, error: expect.stringMatching(/expiry date \(17\) is not a real date/) });
  });

  it('an image with no code in it gives no result', async () => {
    const blank = { width: 200, height: 200, data: new Uint8ClampedArray(200 * 200 * 4).fill(255) };
    expect(await decodeWithZxing(readBarcodes, asImageData(blank))).toEqual([]);
  });
});
