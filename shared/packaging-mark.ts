// Reads a whole UN packaging mark, e.g. "UN 1A1/Y1.4/150/24/NL/VL824": the code (packaging-code.ts), then
// the packing groups and density or gross mass, the test pressure or S, the year, the state and the maker.
// UN Model Regulations 6.1.3.1 (a) to (g) and the examples in 6.1.3.7; 49 CFR 178.503(a) and (e) has the same
// order [mem: recalled, as in ../shared/REFERENCES.md "Packaging codes, which combinations exist"].

import { parsePackagingCode, type ParsedPackagingCode } from './packaging-code';
import { kgToLb, kpaToPsi } from './units';

export type MarkPartName = 'code' | 'performance' | 'contents' | 'year' | 'state' | 'maker' | 'further';

export interface MarkPart {
  part: MarkPartName;
  /** The characters as marked. */
  mark: string;
  meaning: string;
}

export interface PackagingMark {
  parts: MarkPart[];
  /** The packing groups the design type passed, e.g. ['II', 'III'] for Y. */
  packingGroups: string[];
  /** Liquids (a test pressure was marked) or solids and inner packagings (S). */
  contents: 'liquids' | 'solids';
  /** Liquids: the relative density tested, or null when not marked (then at most 1.2). */
  relativeDensity: number | null;
  /** Solids: the maximum gross mass in kg. */
  grossMassKg: number | null;
  grossMassLb: number | null;
  /** Liquids: the hydraulic test pressure in kPa. */
  testPressureKpa: number | null;
  testPressurePsi: number | null;
  yearMade: number;
  state: string;
  maker: string;
  notes: string[];
}

export type PackagingMarkResult = { ok: true; code: ParsedPackagingCode; mark: PackagingMark | null } | { ok: false; error: string };

// 6.1.3.1 (c)(i): X packing groups I, II and III; Y II and III; Z III only [mem].
const PACKING_GROUPS: Readonly<Record<string, string[]>> = { X: ['I', 'II', 'III'], Y: ['II', 'III'], Z: ['III'] };

// Distinguishing signs of vehicles in international traffic (1968 Vienna Convention) that are common on
// drums; any other sign of one to three letters is read as a sign without a name here [mem].
const STATE_NAMES: Readonly<Record<string, string>> = {
  A: 'Austria',
  B: 'Belgium',
  CDN: 'Canada',
  CH: 'Switzerland',
  D: 'Germany',
  E: 'Spain',
  F: 'France',
  GB: 'United Kingdom',
  UK: 'United Kingdom',
  I: 'Italy',
  J: 'Japan',
  NL: 'Netherlands',
  ROK: 'Republic of Korea',
  USA: 'United States of America',
};

function fail(error: string): { ok: false; error: string } {
  return { ok: false, error };
}

/** Splits the mark after the code into its parts: "/" between parts, and a space also between year and state (49 CFR 178.503 examples). */
function partsAfterCode(rest: string[]): string[] {
  const [performance, contents, ...tail] = rest.map((t) => t.trim());
  const words = tail.length > 0 ? [...tail[0]!.split(/\s+/), ...tail.slice(1)] : [];
  return [performance ?? '', contents ?? '', ...words.filter((w) => w !== '')];
}

/**
 * Reads a code alone (mark null) or a whole mark. A missing or malformed part is an error naming the part.
 * `today` decides the century of the two-digit year.
 */
export function readPackagingMark(raw: string, today: Date = new Date()): PackagingMarkResult {
  const parsed = parsePackagingCode(raw);
  if (!parsed.ok) return parsed;
  const segments = raw.trim().split('/');
  if (segments.length === 1) return { ok: true, code: parsed, mark: null };

  const [performance, contents, year, state, maker, ...further] = partsAfterCode(segments.slice(1));
  const perf = /^([XYZ])(\d+(?:\.\d+)?)?$/.exec(performance!.toUpperCase());
  if (!perf) return fail(`"${performance}": after the code comes the packing-group letter X, Y or Z, then the relative density or gross mass, like Y1.4 or Y145.`);
  const [, letter, number] = perf as unknown as [string, string, string | undefined];

  const c = contents!.toUpperCase();
  let liquids: boolean;
  if (c === 'S') liquids = false;
  else if (/^\d+$/.test(c)) liquids = true;
  else return fail(`"${contents}": the third part is the hydraulic test pressure in kPa (liquids, like 150) or S (solids or inner packagings).`);
  if (liquids && (parsed.kind === '4' || parsed.kind === '5'))
    return fail(`"${contents}": a ${parsed.kindLabel} is marked S; only packagings that hold liquids without inner packagings carry a test pressure.`);

  // 6.1.3.1 (c)(ii): liquids, the relative density rounded to the first decimal, may be left out up to 1.2;
  // solids, the maximum gross mass in kg. (d): the test pressure rounded down to the nearest 10 kPa [mem].
  let relativeDensity: number | null = null;
  let grossMassKg: number | null = null;
  if (liquids) {
    if (number !== undefined && !/^\d+\.\d$/.test(number))
      return fail(`"${performance}": for liquids the number after ${letter} is the relative density with one decimal, like ${letter}1.4; a whole number is a gross mass, which goes with S.`);
    relativeDensity = number === undefined ? null : Number(number);
  } else {
    if (number === undefined) return fail(`"${performance}": for solids (S) the letter ${letter} is followed by the maximum gross mass in kg, like ${letter}145.`);
    grossMassKg = Number(number);
  }
  const testPressureKpa = liquids ? Number(c) : null;
  if (testPressureKpa !== null && testPressureKpa % 10 !== 0) return fail(`"${contents}": the test pressure is marked rounded down to the nearest 10 kPa, so it ends in 0.`);

  if (year === undefined || year === '') return fail('The mark stops after the test pressure or S; next come the year of manufacture (two digits), the state and the maker.');
  if (!/^\d{2}$/.test(year)) return fail(`"${year}": the year of manufacture is marked with its last two digits, like 24.`);
  const yy = Number(year);
  const century = Math.floor(today.getUTCFullYear() / 100) * 100;
  const yearMade = century + yy > today.getUTCFullYear() ? century - 100 + yy : century + yy;

  if (state === undefined || state === '') return fail('The mark stops after the year; next come the state (its sign for vehicles in international traffic, like NL) and the maker.');
  const st = state.toUpperCase();
  if (!/^[A-Z]{1,3}$/.test(st)) return fail(`"${state}": the state is marked with its distinguishing sign for vehicles in international traffic, one to three letters, like D or NL.`);
  if (maker === undefined || maker === '') return fail('The mark stops after the state; last comes the maker or the identification the competent authority gave.');

  const groups = PACKING_GROUPS[letter]!;
  const grossMassLb = grossMassKg === null ? null : kgToLb(grossMassKg);
  const testPressurePsi = testPressureKpa === null ? null : kpaToPsi(testPressureKpa);
  const parts: MarkPart[] = [
    { part: 'code', mark: parsed.code + (parsed.suffix ?? ''), meaning: parsed.explanation },
    {
      part: 'performance',
      mark: performance!.toUpperCase(),
      meaning:
        `Tested for packing group${groups.length > 1 ? 's' : ''} ${groups.join(', ')}` +
        (liquids
          ? relativeDensity === null
            ? ', liquids of relative density up to 1.2.'
            : `, liquids of relative density up to ${relativeDensity.toFixed(1)}.`
          : `, up to ${grossMassKg} kg gross mass.`),
    },
    { part: 'contents', mark: c, meaning: liquids ? `Hydraulic test pressure ${testPressureKpa} kPa: for liquids.` : 'S: for solids or inner packagings.' },
    { part: 'year', mark: year, meaning: `Made in ${yearMade}.` },
    { part: 'state', mark: st, meaning: `Mark allocated under the authority of ${STATE_NAMES[st] ?? `the state with sign ${st}`}.` },
    { part: 'maker', mark: maker, meaning: 'The maker, or the identification the competent authority gave the packaging.' },
  ];
  if (further.length > 0) parts.push({ part: 'further', mark: further.join('/'), meaning: 'Further marks (a reconditioner’s, for example) are not read here.' });

  const notes: string[] = [];
  if (parsed.material === 'H' && (parsed.kind === '1' || parsed.kind === '3')) {
    // 6.1.3.1 (e): 1H and 3H also carry the month; 4.1.1.15: plastic drums and jerricans five years from manufacture [mem].
    notes.push('Plastic drums and jerricans also carry the month of manufacture, often on a dial near the mark.');
    notes.push(`Unless the competent authority allows longer, a plastic drum or jerrican carries dangerous goods for five years from manufacture: until about ${yearMade + 5}.`);
  }
  const mark: PackagingMark = {
    parts,
    packingGroups: groups,
    contents: liquids ? 'liquids' : 'solids',
    relativeDensity,
    grossMassKg,
    grossMassLb,
    testPressureKpa,
    testPressurePsi,
    yearMade,
    state: st,
    maker,
    notes,
  };
  return { ok: true, code: parsed, mark };
}
