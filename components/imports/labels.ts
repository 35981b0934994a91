import type { ImportCounts, ImportKind, ImportOutcome } from '../data/imports';

export const KIND_LABELS: Record<ImportKind, string> = {
  'drum-types': 'Drum types',
  'dip-tubes': 'Dip tubes',
  connectors: 'Dispense heads',
};

/** What one row of each kind of sheet holds. */
export const KIND_HINTS: Record<ImportKind, string> = {
  'drum-types': 'One row per opening: rows with the same supplier and part number make one drum type with all its openings.',
  'dip-tubes': 'One row per dip tube. Name the unit of each length in its column (length_mm or length_in), or add a unit column.',
  connectors: 'One row per dispense head. Leave the return bore empty when the head has no return path.',
};

export const OUTCOME_WORDS: Record<ImportOutcome, { word: string; tone: 'muted' | 'fits' | 'noFit' }> = {
  'dry-run': { word: 'Dry run', tone: 'muted' },
  committed: { word: 'Imported', tone: 'fits' },
  refused: { word: 'Refused', tone: 'noFit' },
};

/** "3 new · 1 changed · 0 unchanged · 1 rejected" */
export const countsLine = (c: ImportCounts) => `${c.new} new · ${c.changed} changed · ${c.unchanged} unchanged · ${c.rejected} rejected`;

export const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;
