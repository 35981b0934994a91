import type { Region } from '@/shared/contract/records';
import type { PickedRef } from '../ui/record-picker';
import type { Draft } from './draft';
import type { RecordForm } from './use-record-form';

type Stamped = { id: string; version: number };
type KeysOf<D, V> = { [K in keyof D]: D[K] extends V ? K : never }[keyof D] & string;

/**
 * Props that tie a field to one key of a form's draft: its label (from the record's labels, `labelOf`),
 * value, change handler, message, blur, focus ref and test id (`form-<key>`). A field's own words (hint,
 * suffix) and a label the record words otherwise are written beside the spread.
 */
export function fieldBinders<R extends Stamped, D extends Draft>(form: RecordForm<R, D>, labelOf: (path: string) => string | undefined) {
  const label = (key: string) => labelOf(key) ?? key;
  const common = <K extends keyof D & string>(key: K) => ({ label: label(key), testID: `form-${key}`, ...form.field(key) });
  /** A LengthField, or a record picker (which has its own label). */
  const value = <K extends keyof D & string>(key: K) => ({ ...common(key), value: form.draft[key], onChange: (v: D[K]) => form.set(key, v) });
  /** A TextField or a NumberField: the draft keeps the text as typed. */
  const text = <K extends KeysOf<D, string>>(key: K) => ({ ...common(key), value: form.draft[key] as string, onChangeText: (v: string) => form.set(key, v as D[K]) });
  return {
    text,
    /** A code as marked on the part (a part number, a UN code): capitals, no autocorrect. */
    code: <K extends KeysOf<D, string>>(key: K) => ({ ...text(key), autoCapitalize: 'characters' as const, autoCorrect: false }),
    value,
    /** ChoiceChips: no text to focus, so only the message. */
    choice: <K extends keyof D & string>(key: K) => {
      const { label, testID, value: chosen, onChange, error } = value(key);
      return { label, testID, value: chosen, onChange, error };
    },
  };
}

/** The supplier picker of a record with a region: the supplier's region is the usual answer; the person can still change it. */
export function bindSupplier<R extends Stamped, D extends Draft & { supplierId: PickedRef | null; region: Region | null }>(form: RecordForm<R, D>) {
  return {
    value: form.draft.supplierId,
    onChange: (picked: PickedRef | null, supplier: { region: Region } | null) => {
      form.set('supplierId', picked as D['supplierId']);
      if (supplier && !form.draft.region) form.set('region', supplier.region as D['region']);
    },
    testID: 'form-supplierId',
    ...form.field('supplierId'),
  };
}
