import { decodeCsv } from '../server/imports/decode';
import { seeded } from './support/spec-sheets';
for (const [label, pHigh] of [['high', 1], ['half', 0.5], ['quarter', 0.25]] as const) {
  const out: Record<string, number> = {};
  for (let seed = 1; seed <= 100; seed++) {
    const rnd = seeded(seed);
    const alphabet = 'abcdefghijklmnopqrstuvwxyz0123456789,\n';
    const b = Buffer.from(Array.from({ length: 200 }, () => (rnd(1000) < pHigh * 1000 ? 0x80 + rnd(128) : alphabet.charCodeAt(rnd(alphabet.length)))));
    try { const d = decodeCsv(b); out[d.encoding] = (out[d.encoding] ?? 0) + 1; } catch (e) { const c = `${(e as { status: number }).status} ${(e as { code: string }).code}`; out[c] = (out[c] ?? 0) + 1; if (seed === 1) console.log(label, (e as Error).message.slice(0, 120)); }
  }
  console.log(label, out);
}
