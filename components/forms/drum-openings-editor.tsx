import { StyleSheet, Text, View } from 'react-native';
import { DRUM_TYPE_LIMITS } from '@/shared/records/drum-type';
import type { OpeningRecord } from '@/shared/contract/records';
import type { LengthUnit } from '@/shared/units';
import type { DrumTypeRecord } from '../data/drum-types';
import { colors, radius, space, type, field } from '../theme';
import { Button } from '../ui/button';
import { ChoiceChips } from '../ui/choice-chips';
import { lengthDraft, LengthField, type LengthDraft } from '../ui/number-field';
import type { PickedRef } from '../ui/record-picker';
import { TextField } from '../ui/text-field';
import type { DrumTypeDraft } from './drum-type-form';
import { FieldRow } from './form-frame';
import { POSITION_OPTIONS } from './options';
import { KeyCodePicker, ThreadPicker } from './pickers';
import type { RecordForm } from './use-record-form';

const MAX_OPENINGS = DRUM_TYPE_LIMITS.openingsMax;
type Position = OpeningRecord['position'];

export type OpeningDraft = {
  /** Keeps React's list stable while openings are added and removed; never sent. */
  _key: string;
  label: string;
  threadCode: PickedRef | null;
  boreMm: LengthDraft;
  keyCode: PickedRef | null;
  position: Position | null;
};

let nextKey = 0;
export const newKey = () => `o${++nextKey}`;
export const emptyOpening = (unit: LengthUnit): OpeningDraft => ({ _key: newKey(), label: '', threadCode: null, boreMm: lengthDraft(null, unit), keyCode: null, position: null });

/** The repeatable list of a drum's openings (bungs): label, thread, bore, key and position each. */
export function OpeningsEditor({ form }: { form: RecordForm<DrumTypeRecord, DrumTypeDraft> }) {
  const { draft, set, field, unit } = form;
  const change = (i: number, key: keyof OpeningDraft, value: unknown) => {
    const next = draft.openings.map((o, j) => (j === i ? { ...o, [key]: value } : o));
    set('openings', next, `openings.${i}.${key}`);
  };
  const remove = (i: number) =>
    set(
      'openings',
      draft.openings.filter((_, j) => j !== i),
      'openings',
    );
  const add = () => {
    set('openings', [...draft.openings, emptyOpening(unit)], 'openings');
  };
  const listError = field('openings').error;
  return (
    <View style={styles.openings}>
      {draft.openings.map((o, i) => {
        // One field of this opening: its value, change handler, message and test id.
        const at = <K extends keyof OpeningDraft>(key: K) => ({
          value: o[key],
          onChange: (v: OpeningDraft[K]) => change(i, key, v),
          testID: `form-openings-${i}-${key}`,
          ...field(`openings.${i}.${key}`),
        });
        return (
          <View key={o._key} style={styles.opening} testID={`form-opening-${i}`} role="group" aria-label={`Opening ${i + 1}`}>
            <View style={styles.openingHead}>
              <Text role="heading" aria-level={3} style={type.label}>
                Opening {i + 1}
              </Text>
              <Button
                label="Remove"
                variant="quiet"
                accessibilityLabel={`Remove opening ${i + 1}`}
                disabled={draft.openings.length <= 1}
                onPress={() => remove(i)}
                testID={`form-openings-${i}-remove`}
              />
            </View>
            <FieldRow>
              <TextField
                label="Label"
                hint="As marked or as people say it, e.g. large bung."
                value={o.label}
                onChangeText={(v) => change(i, 'label', v)}
                testID={`form-openings-${i}-label`}
                {...field(`openings.${i}.label`)}
              />
              <LengthField label="Bore" hint="Inside diameter of the opening." {...at('boreMm')} />
            </FieldRow>
            <FieldRow>
              <ThreadPicker {...at('threadCode')} />
              <KeyCodePicker {...at('keyCode')} />
            </FieldRow>
            <ChoiceChips label="Position" options={POSITION_OPTIONS} {...at('position')} />
          </View>
        );
      })}
      {listError ? (
        <Text role="alert" style={styles.error} testID="form-openings-error">
          {listError}
        </Text>
      ) : null}
      <View style={styles.addRow}>
        <Button label="Add an opening" variant="secondary" disabled={draft.openings.length >= MAX_OPENINGS} onPress={add} testID="form-openings-add" />
        {draft.openings.length >= MAX_OPENINGS ? <Text style={type.small}>A drum type has at most {MAX_OPENINGS} openings.</Text> : null}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  openings: { gap: space.md },
  opening: { borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, padding: space.md, gap: space.md, backgroundColor: colors.paper },
  openingHead: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between' },
  addRow: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  error: field.error,
});
