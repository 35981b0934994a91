// Field checks run in the browser on blur and on submit, so a person hears about a problem before the round
// trip. They take the limits and rules of shared/records/<record>.ts, as the API does; the server checks again and has the
// last word (its messages land on the same fields).
import { lengthDraftMm, parseNumber, type LengthDraft } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import type { FieldErrors } from '../ui/form-errors';

/** Collects messages by field path in the order fields appear, so the first is the first to fix. */
export class Checks {
  readonly errors: FieldErrors = {};

  private add(path: string, message: string | null): void {
    if (message && !(path in this.errors)) this.errors[path] = message;
  }

  text(path: string, label: string, value: string, opts: { max: number; optional?: boolean }): void {
    const t = value.trim();
    if (!t) this.add(path, opts.optional ? null : `${label} is required.`);
    else if (t.length > opts.max) this.add(path, `${label} must be at most ${opts.max} characters (it has ${t.length}).`);
  }

  pick(path: string, label: string, value: PickedRef | null, what: string): void {
    if (!value) this.add(path, `${label} is required: pick ${what}.`);
  }

  choice(path: string, label: string, value: unknown): void {
    if (value === null || value === undefined || value === '') this.add(path, `${label} is required: choose one.`);
  }

  /** A length in mm: more than 0, at most `maxMm`. Returns the mm value when it is valid. */
  length(path: string, label: string, value: LengthDraft, opts: { maxMm: number; optional?: boolean }): number | null {
    const mm = lengthDraftMm(value);
    if (mm === null) {
      this.add(path, opts.optional ? null : `${label} is required.`);
      return null;
    }
    if (Number.isNaN(mm)) {
      this.add(path, `${label} must be a number, like 851 or 33.5.`);
      return null;
    }
    if (mm <= 0) {
      this.add(path, `${label} must be more than 0 (you entered ${value.text.trim()} ${value.unit}).`);
      return null;
    }
    if (mm > opts.maxMm) {
      this.add(path, `${label} must be at most ${opts.maxMm} mm (you entered ${value.text.trim()} ${value.unit}).`);
      return null;
    }
    return mm;
  }

  /** A plain number within [min, max] (min exclusive when `above` is set). */
  number(path: string, label: string, text: string, opts: { min: number; max: number; above?: boolean; unit?: string }): number | null {
    const n = parseNumber(text);
    const u = opts.unit ? ` ${opts.unit}` : '';
    if (n === null) this.add(path, `${label} is required.`);
    else if (Number.isNaN(n)) this.add(path, `${label} must be a number.`);
    else if (opts.above ? n <= opts.min : n < opts.min) this.add(path, `${label} must be ${opts.above ? 'more than' : 'at least'} ${opts.min}${u}.`);
    else if (n > opts.max) this.add(path, `${label} must be at most ${opts.max}${u}.`);
    else return n;
    return null;
  }

  /** A rule between fields, e.g. bore smaller than outside diameter. */
  rule(path: string, ok: boolean, message: string): void {
    if (!ok) this.add(path, message);
  }
}

export const mmOf = (d: LengthDraft): number => lengthDraftMm(d) as number;
export const trimOrNull = (s: string): string | null => (s.trim() === '' ? null : s.trim());
