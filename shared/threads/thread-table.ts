// The thread table as data. Row codes are stable identifiers: the database seed, the API and the fit
// rules refer to threads by code only, so never rename a code; add a new row instead.

import { MM_PER_IN } from '../units';

export type ThreadFamily = 'NPS' | 'NPT' | 'G' | 'R' | 'Rc' | 'Rp' | 'buttress' | 'other';

/** Which side of a joint a thread is cut on: a drum's bung is internal, a dip tube's plug external. */
export type ThreadSide = 'internal' | 'external';
export const THREAD_SIDES: readonly ThreadSide[] = ['internal', 'external'];

/**
 * The sides each family is made on. ISO 7-1 names the side in the family: R is external only, Rc and Rp
 * internal only [mem, ISO 7-1 clause 1]; G, NPT, NPS and buttress bungs are made both ways (common practice).
 */
export const FAMILY_SIDES: Record<ThreadFamily, readonly ThreadSide[]> = {
  NPS: THREAD_SIDES,
  NPT: THREAD_SIDES,
  G: THREAD_SIDES,
  R: ['external'],
  Rc: ['internal'],
  Rp: ['internal'],
  buttress: THREAD_SIDES,
  other: THREAD_SIDES,
};
export type ThreadForm = 'tapered' | 'parallel';

export interface ThreadSpecRow {
  /** Stable identifier, e.g. 'NPT-3/4', 'NPS-2', 'G-2', 'BT-56x4'. */
  code: string;
  family: ThreadFamily;
  /** How the trade writes the size, e.g. '3/4 in NPT', 'G 2', '56x4'. */
  nominalLabel: string;
  /** Major (crest) diameter. For NPT this is the pipe OD, i.e. the large end of the taper. */
  majorDiameterMm: number;
  pitchMm: number;
  threadsPerInch: number;
  /** Included angle between flanks. */
  flankAngleDeg: number;
  form: ThreadForm;
  /** Where the dimensions come from. */
  standard: string;
}

/** Nominal pipe sizes carried by the table, with the label fragment and the code fragment. */
interface PipeSize {
  label: string;
  codePart: string;
}

const SIZE_1_2: PipeSize = { label: '1/2', codePart: '1/2' };
const SIZE_3_4: PipeSize = { label: '3/4', codePart: '3/4' };
const SIZE_1: PipeSize = { label: '1', codePart: '1' };
// A space is awkward in an identifier, so 1 1/2 is written the way fittings catalogues do: 1-1/2.
const SIZE_1_1_2: PipeSize = { label: '1 1/2', codePart: '1-1/2' };
const SIZE_2: PipeSize = { label: '2', codePart: '2' };

// ASME B1.20.1 [pub]: pipe OD (in) and threads per inch for each nominal size.
const ASME_PIPE: Array<{ size: PipeSize; odIn: number; tpi: number }> = [
  { size: SIZE_1_2, odIn: 0.84, tpi: 14 },
  { size: SIZE_3_4, odIn: 1.05, tpi: 14 },
  { size: SIZE_1, odIn: 1.315, tpi: 11.5 },
  { size: SIZE_1_1_2, odIn: 1.9, tpi: 11.5 },
  { size: SIZE_2, odIn: 2.375, tpi: 11.5 },
];

// ISO 228-1 [pub]: threads per inch, pitch (mm, as published) and major diameter (mm).
const ISO_228: Array<{ size: PipeSize; tpi: number; pitchMm: number; majorMm: number }> = [
  { size: SIZE_1_2, tpi: 14, pitchMm: 1.814, majorMm: 20.955 },
  { size: SIZE_3_4, tpi: 14, pitchMm: 1.814, majorMm: 26.441 },
  { size: SIZE_1, tpi: 11, pitchMm: 2.309, majorMm: 33.249 },
  { size: SIZE_1_1_2, tpi: 11, pitchMm: 2.309, majorMm: 47.803 },
  { size: SIZE_2, tpi: 11, pitchMm: 2.309, majorMm: 59.614 },
];

/** The ASME B1.20.1 pipe sizes in one family: NPT tapered, NPS straight. */
const asmePipeRows = (family: 'NPT' | 'NPS', form: ThreadForm, standard: string): ThreadSpecRow[] =>
  ASME_PIPE.map(({ size, odIn, tpi }): ThreadSpecRow => ({
    code: `${family}-${size.codePart}`,
    family,
    nominalLabel: `${size.label} in ${family}`,
    majorDiameterMm: odIn * MM_PER_IN,
    pitchMm: MM_PER_IN / tpi,
    threadsPerInch: tpi,
    flankAngleDeg: 60,
    form,
    standard,
  }));

const NPT_ROWS = asmePipeRows('NPT', 'tapered', 'ASME B1.20.1');

// Straight pipe threads share the NPT form, pitch and OD of the same nominal size [mem]: which is
// exactly why NPS and NPT can only be told apart by checking for taper.
const NPS_ROWS = asmePipeRows('NPS', 'parallel', 'ASME B1.20.1 (straight pipe thread)');

const G_ROWS: ThreadSpecRow[] = ISO_228.map(({ size, tpi, pitchMm, majorMm }): ThreadSpecRow => ({
  code: `G-${size.codePart}`,
  family: 'G',
  nominalLabel: `G ${size.label}`,
  majorDiameterMm: majorMm,
  pitchMm,
  threadsPerInch: tpi,
  flankAngleDeg: 55,
  form: 'parallel',
  standard: 'ISO 228-1',
}));

// ISO 7-1 [mem, ../shared/REFERENCES.md "Threads, more"]: the 55 degree form, pitch and gauge-plane diameter of
// ISO 228-1 at each size, taper 1:16 on diameter (as NPT). R external taper, Rc internal taper, Rp internal
// parallel (mates with R). G and R differ by taper only; R and NPT by flank angle (55 against 60 degrees)
// and at 1 in and above by pitch (11 against 11.5 per inch).
const ISO_7_FAMILIES: Array<{ family: 'R' | 'Rc' | 'Rp'; form: ThreadForm; what: string }> = [
  { family: 'R', form: 'tapered', what: 'external taper' },
  { family: 'Rc', form: 'tapered', what: 'internal taper' },
  { family: 'Rp', form: 'parallel', what: 'internal parallel' },
];
const ISO_7_ROWS: ThreadSpecRow[] = ISO_7_FAMILIES.flatMap(({ family, form, what }) =>
  ISO_228.map(({ size, tpi, pitchMm, majorMm }): ThreadSpecRow => ({
    code: `${family}-${size.codePart}`,
    family,
    nominalLabel: `${family} ${size.label}`,
    majorDiameterMm: majorMm,
    pitchMm,
    threadsPerInch: tpi,
    flankAngleDeg: 55,
    form,
    standard: `ISO 7-1 (${what})`,
  })),
);

// Plastic-drum buttress bungs are named diameter x pitch in mm; no dimension standard was found, so
// only the name's two numbers are trusted. Buttress forms pair a near-square load flank with a sloped
// clearance flank; 45 deg is the clearance flank commonly quoted and is what a flank gauge will not
// mistake for 55 or 60 [mem].
const BUTTRESS_ROWS: ThreadSpecRow[] = [
  { majorMm: 56, pitchMm: 4 },
  { majorMm: 70, pitchMm: 6 },
].map(({ majorMm, pitchMm }): ThreadSpecRow => ({
  code: `BT-${majorMm}x${pitchMm}`,
  family: 'buttress',
  nominalLabel: `${majorMm}x${pitchMm} buttress`,
  majorDiameterMm: majorMm,
  pitchMm,
  threadsPerInch: MM_PER_IN / pitchMm,
  flankAngleDeg: 45,
  form: 'parallel',
  standard: 'no dimension standard found',
}));

// Frozen so no caller can edit the shared table in place.
export const THREAD_TABLE: readonly Readonly<ThreadSpecRow>[] = Object.freeze([...NPT_ROWS, ...NPS_ROWS, ...G_ROWS, ...ISO_7_ROWS, ...BUTTRESS_ROWS].map((row) => Object.freeze(row)));

export function findThreadSpec(code: string, table: readonly ThreadSpecRow[] = THREAD_TABLE): ThreadSpecRow | undefined {
  return table.find((row) => row.code === code);
}
