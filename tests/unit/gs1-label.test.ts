import { gs1CheckDigit, gs1Year, hasValidCheckDigit, parseDrumLabel, parseGs1Date, type DrumLabel } from '../../shared/gs1';
import { LOT_NUMBER_MAX_LENGTH, LOT_NUMBER_PATTERN, lotNumberProblem } from '../../shared/lot-number';

// Sources: GS1 General Specifications (open standard), as summarised in shared/REFERENCES.md "Drum labels"
// [mem: confirm against the current edition]. Section numbers are given beside each check.
const GS = '\u001d';
const TODAY = new Date(Date.UTC(2026, 11, 2));
// GS1's own example GTIN. Check digit by hand (§7.9.1): the first 13 digits 0950600013435 weighted
// 3,1,3,… from the right: 5·3 + 3 + 4·3 + 3 + 1·3 + 0 + 0 + 0 + 6·3 + 0 + 5·3 + 9 + 0·3 = 78; (10 − 8) mod 10 = 2.
const GTIN = '09506000134352';
/** An SSCC (AI 00, 18 digits); the parser skips it, so its own check digit is not read. */
const SSCC = '095060001000000012';

function ok(text: string, today = TODAY): DrumLabel {
  const r = parseDrumLabel(text, today);
  if (!r.ok) throw new Error(`expected ${JSON.stringify(text)} to read: ${r.error}`);
  const { ok: _ok, ...label } = r;
  return label;
}

function refused(text: string, today = TODAY): string {
  const r = parseDrumLabel(text, today);
  if (r.ok) throw new Error(`expected ${JSON.stringify(text)} to be refused, got ${JSON.stringify(r)}`);
  // Every refusal is one sentence a clerk can read.
  expect(r.error).toMatch(/^The .+\.$/);
  return r.error;
}

describe('GS1 check digit', () => {
  it('computes and verifies the GTIN-14 check digit', () => {
    // GS1 General Specifications §7.9.1: weights 3,1,3,… from the right; check = (10 − sum mod 10) mod 10
    expect(gs1CheckDigit('0950600013435')).toBe(2);
    expect(hasValidCheckDigit(GTIN)).toBe(true);
    expect(hasValidCheckDigit('09506000134359')).toBe(false);
    // GS1 General Specifications §7.9.1: a sum that is a multiple of 10 gives 0, not 10.
    // 0000000000055: 5·3 + 5·1 = 20 → 0; 0000000000037: 7·3 + 3·1 = 24 → 6.
    expect(gs1CheckDigit('0000000000055')).toBe(0);
    expect(gs1CheckDigit('0000000000037')).toBe(6);
  });
});

describe('GS1 dates', () => {
  it('reads YYMMDD, with day 00 as the last day of the month', () => {
    // GS1 General Specifications §3.4.7 (and §3.4.2 for AI 11): day 00 = last day of month
    expect(parseGs1Date('270400', TODAY)).toEqual({ ok: true, iso: '2027-04-30' });
    expect(parseGs1Date('270200', TODAY)).toEqual({ ok: true, iso: '2027-02-28' });
    // Gregorian calendar: 2028 is a leap year, so day 00 of February is the 29th
    expect(parseGs1Date('280200', TODAY)).toEqual({ ok: true, iso: '2028-02-29' });
    expect(parseGs1Date('261231', TODAY)).toEqual({ ok: true, iso: '2026-12-31' });
  });

  it('refuses days and months that do not exist instead of rolling them over', () => {
    // GS1 General Specifications §3.4.7: MM is 01 to 12, DD a day of that month or 00
    expect(parseGs1Date('270231', TODAY)).toMatchObject({ ok: false, error: expect.stringMatching(/day 31.*28 days/) });
    expect(parseGs1Date('260631', TODAY)).toMatchObject({ ok: false, error: expect.stringMatching(/30 days/) });
    expect(parseGs1Date('271300', TODAY)).toMatchObject({ ok: false, error: expect.stringMatching(/month 13/) });
    expect(parseGs1Date('270015', TODAY)).toMatchObject({ ok: false, error: expect.stringMatching(/month 00/) });
    expect(parseGs1Date('27021', TODAY)).toMatchObject({ ok: false });
  });

  it('chooses the century by the GS1 sliding window', () => {
    // GS1 General Specifications §7.12: YY − current YY of 51 to 99 → previous century; −99 to −50 → next; else current
    expect(gs1Year(76, TODAY)).toBe(2076); // 76 − 26 = 50: this century
    expect(gs1Year(77, TODAY)).toBe(1977); // 51: previous century
    expect(gs1Year(99, TODAY)).toBe(1999);
    expect(gs1Year(0, TODAY)).toBe(2000); // −26: this century
    const in2060 = new Date(Date.UTC(2060, 0, 1));
    expect(gs1Year(10, in2060)).toBe(2110); // 10 − 60 = −50: next century
    expect(gs1Year(11, in2060)).toBe(2011); // −49: this century
    const in2099 = new Date(Date.UTC(2099, 5, 1));
    expect(gs1Year(0, in2099)).toBe(2100); // −99: next century
    expect(gs1Year(49, in2099)).toBe(2149); // −50: next century
    expect(gs1Year(50, in2099)).toBe(2050); // −49: this century
  });
});

describe('parseDrumLabel: GS1 element strings', () => {
  const full = { kind: 'gs1', gtin: GTIN, batch: 'LOT-4711', productionDate: '2026-11-14', expiryDate: '2027-05-31', serial: 'S99' };

  it('reads a GS1 DataMatrix (]d2) with a separator after the variable-length batch', () => {
    // GS1 General Specifications §7.8: a variable-length field that is not last ends with FNC1 (ASCII 29)
    expect(ok(`]d201${GTIN}112611141727050010LOT-4711${GS}21S99`)).toEqual(full);
  });

  it('reads GS1-128 (]C1) and GS1 QR (]Q3) the same way, in any order of fields', () => {
    expect(ok(`]C121S99${GS}10LOT-4711${GS}01${GTIN}1126111417270500`)).toEqual(full);
    expect(ok(`]Q301${GTIN}10LOT-4711${GS}1126111421S99${GS}17270500`)).toEqual(full);
  });

  it('reads the bracketed human-readable form, with or without spaces', () => {
    // GS1 General Specifications §4.15: the human-readable interpretation shows AIs in parentheses
    expect(ok(`(01)${GTIN}(11)261114(17)270500(10)LOT-4711(21)S99`)).toEqual(full);
    expect(ok(`(01) ${GTIN} (17) 270500 (10) LOT-4711`)).toMatchObject({ gtin: GTIN, expiryDate: '2027-05-31', batch: 'LOT-4711', serial: null });
    expect(ok(`]C1(01)${GTIN}(10)LOT-4711`)).toMatchObject({ kind: 'gs1', batch: 'LOT-4711' });
  });

  it('reads GS1 data handed over without a symbology identifier', () => {
    // A leading FNC1 transmitted as ASCII 29, an embedded separator, or (01) with a valid GTIN at the start.
    expect(ok(`${GS}01${GTIN}10LOT-4711${GS}17270500`)).toMatchObject({ kind: 'gs1', batch: 'LOT-4711', expiryDate: '2027-05-31' });
    expect(ok(`01${GTIN}1727050010LOT-4711`)).toMatchObject({ kind: 'gs1', batch: 'LOT-4711' });
    // Without an identifier, a GTIN whose check digit fails means the text is not taken for GS1 data.
    expect(ok('010950600013435917270500')).toMatchObject({ kind: 'text', batch: '010950600013435917270500' });
  });

  it('gives the GTIN and dates with no batch when the label has no (10)', () => {
    expect(ok(`]d201${GTIN}17270500`)).toEqual({ kind: 'gs1', gtin: GTIN, batch: null, productionDate: null, expiryDate: '2027-05-31', serial: null });
  });

  it('skips unknown AIs of predefined length without a separator, and others up to their separator', () => {
    // GS1 General Specifications §7.8.5 (predefined-length table) [mem]: 15 best before (8 in all),
    // 3102 net weight (10 in all), 00 SSCC (20 in all) need no separator; 240 and 91 end with FNC1.
    expect(ok(`]d201${GTIN}15270300310200125000${SSCC}10LOT-4711`)).toMatchObject({ gtin: GTIN, batch: 'LOT-4711', expiryDate: null });
    expect(ok(`]d2240PART-9${GS}91INTERNAL-7${GS}10LOT-4711${GS}01${GTIN}`)).toMatchObject({ gtin: GTIN, batch: 'LOT-4711' });
    expect(ok(`]d201${GTIN}10LOT-4711${GS}7003261114093`)).toMatchObject({ batch: 'LOT-4711' });
  });

  it('refuses a GTIN whose check digit fails, naming the right digit', () => {
    // GS1 General Specifications §7.9.1: the last digit of a GTIN is its check digit
    expect(refused(`]d2010950600013435910LOT-4711`)).toMatch(/GTIN \(01\) 09506000134359 fails its check digit.*would be 2/);
  });

  it('refuses an impossible date', () => {
    expect(refused(`]d201${GTIN}1727023110LOT-4711`)).toMatch(/expiry date \(17\) is not a real date: .*day 31/);
    expect(refused(`]d201${GTIN}11261300`)).toMatch(/production date \(11\).*month 13/);
  });

  it('refuses a batch over 20 characters and says the separator may be missing', () => {
    // GS1 General Specifications §3.4.1: AI (10) is X..20
    expect(ok(`]d210${'A'.repeat(20)}`).batch).toBe('A'.repeat(20));
    expect(refused(`]d210${'A'.repeat(21)}`)).toMatch(/batch or lot \(10\) is 21 characters long; GS1 allows at most 20 \(a separator/);
    // The batch not ended by its separator swallows the next field (here the expiry date).
    expect(refused(`]d210LOT-4711-AB1717270500`)).toMatch(/separator after it may be missing/);
  });

  it('refuses a serial over 20 characters', () => {
    // GS1 General Specifications §3.5.2 [mem]: AI (21) is X..20
    expect(refused(`]d221${'9'.repeat(21)}`)).toMatch(/serial \(21\) is 21 characters/);
  });

  it('refuses characters outside GS1 set 82, and batch characters the lot-number field cannot hold', () => {
    // GS1 General Specifications §7.11, figure 7.11-1: character set 82 has no space and no #
    expect(refused(`]d210LOT 4711`)).toMatch(/holds characters GS1 does not allow/);
    // '+' is in set 82, but the lot-number rule (shared/lot-number.ts) does not allow it.
    expect(refused(`]d210LOT+4711`)).toMatch(/batch or lot \(10\) LOT\+4711 holds “\+”/);
  });

  it('refuses broken element strings with a sentence', () => {
    expect(refused(`]d201095060`)).toMatch(/The \(01\) field needs 14 digits, and the code ends before that/);
    expect(refused(`]d2AB123`)).toMatch(/application identifier \(digits\) was expected/);
    expect(refused(`]d210LOT-1${GS}10LOT-2`)).toMatch(/two different values for the batch/);
    expect(refused(`]d2${GS}`)).toMatch(/nothing a drum label is read for/);
    expect(refused(`]d210${GS}17270500`)).toMatch(/batch or lot \(10\) is empty/);
  });
});

describe('parseDrumLabel: plain text codes', () => {
  it('takes a plain code as the lot number, trimmed', () => {
    expect(ok('  LR-26-3101 \r\n')).toEqual({ kind: 'text', gtin: null, batch: 'LR-26-3101', productionDate: null, expiryDate: null, serial: null });
    // A plain QR code (]Q1) or Code 128 (]C0): the identifier says it is not GS1, even for digits starting 01.
    expect(ok(']Q1LOT 42/B')).toMatchObject({ kind: 'text', batch: 'LOT 42/B' });
    expect(ok(`]C001${GTIN}10X`)).toMatchObject({ kind: 'text', batch: `01${GTIN}10X` });
  });

  it('refuses control characters, over-long codes and characters a lot number cannot hold', () => {
    expect(refused('LOT\u00014711')).toMatch(/control character \(code 1\)/);
    expect(refused('L'.repeat(LOT_NUMBER_MAX_LENGTH + 1))).toMatch(/61 characters long; a lot number has at most 60/);
    expect(ok('L'.repeat(LOT_NUMBER_MAX_LENGTH)).batch).toHaveLength(60);
    expect(refused('https://labels.example/lot?id=4711')).toMatch(/holds “:”/);
    expect(refused('-4711')).toMatch(/starts with “-”/);
    expect(refused('   ')).toMatch(/empty/);
  });
});

describe('the lot-number rule in shared/lot-number.ts', () => {
  it('is the pattern the DTO validates with', () => {
    expect(LOT_NUMBER_PATTERN.test('LR-26-3101')).toBe(true);
    expect(LOT_NUMBER_PATTERN.test('Charge 7/A_1.2')).toBe(true);
    expect(LOT_NUMBER_PATTERN.test('LOT#1')).toBe(false);
    expect(lotNumberProblem('LR-26-3101')).toBeNull();
    expect(lotNumberProblem('LOT#1')).toMatch(/^The lot number holds “#”/);
  });
});
