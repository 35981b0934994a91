// What a form holds while someone edits, and the three-way merge used when someone else saved first.
import { lengthDraftMm, type LengthDraft } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';

/** A form's state: one entry per API field (lengths as LengthDraft, picks as PickedRef). */
export type Draft = Record<string, unknown>;

const isLength = (v: unknown): v is LengthDraft => !!v && typeof v === 'object' && 'unit' in v && 'text' in v;
const isRef = (v: unknown): v is PickedRef => !!v && typeof v === 'object' && 'id' in v && 'label' in v && Object.keys(v).length === 2;

/**
 * A value reduced to what it means, for comparing: lengths in mm (so 851 mm equals 33.5039 in), picks by
 * id, text trimmed; keys starting with "_" (list keys for React) are left out.
 */
export function meaning(v: unknown): unknown {
  if (isLength(v)) {
    const mm = lengthDraftMm(v);
    return mm == null || Number.isNaN(mm) ? `text:${v.text.trim()}` : Math.round(mm * 1e4) / 1e4;
  }
  if (isRef(v)) return v.id;
  if (typeof v === 'string') return v.trim();
  if (Array.isArray(v)) return v.map(meaning);
  if (v && typeof v === 'object') {
    return Object.fromEntries(
      Object.entries(v)
        .filter(([k]) => !k.startsWith('_'))
        .sort(([a], [b]) => a.localeCompare(b))
        .map(([k, x]) => [k, meaning(x)]),
    );
  }
  return v;
}

export const sameMeaning = (a: unknown, b: unknown): boolean => JSON.stringify(meaning(a)) === JSON.stringify(meaning(b));

export interface FieldChange {
  key: string;
  /** They changed it and so did you: your value is the one kept on re-apply. */
  both: boolean;
}

/** The fields someone else changed between the version the form was based on and theirs. */
export function theirChanges(original: Draft, theirs: Draft, mine: Draft): FieldChange[] {
  return Object.keys(theirs)
    .filter((k) => !sameMeaning(original[k], theirs[k]))
    .map((key) => ({ key, both: !sameMeaning(original[key], mine[key]) && !sameMeaning(mine[key], theirs[key]) }));
}

/** Their version with my changes on top: a field I changed keeps my value, every other field takes theirs. */
export function reapply<D extends Draft>(original: D, theirs: D, mine: D): D {
  const out: Draft = { ...theirs };
  for (const k of Object.keys(mine)) if (!sameMeaning(original[k], mine[k])) out[k] = mine[k];
  return out as D;
}

/** A draft value in words, for the conflict summary. */
export function describeValue(v: unknown): string {
  if (v === null || v === undefined || v === '') return 'none';
  if (isLength(v)) return v.text.trim() ? `${v.text.trim()} ${v.unit}` : 'none';
  if (isRef(v)) return v.label;
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  if (Array.isArray(v)) return `${v.length} item${v.length === 1 ? '' : 's'}`;
  return String(v);
}
