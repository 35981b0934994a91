import { forwardRef, useImperativeHandle, useRef } from 'react';
import { StyleSheet, View, type TextInput } from 'react-native';
import type { DrumLabel } from '@/shared/gs1';
import { ScanLabelButton } from '../scan/scan-label-button';
import { space } from '../theme';
import { TextField } from '../ui/text-field';
import { ScannedLabel } from './scanned-label';

interface LotNumberFieldProps {
  value: string;
  onChangeText: (text: string) => void;
  /** The label last scanned for this lot (null: typed by hand, or changed since). */
  label: DrumLabel | null;
  /** Every scan (its batch becomes the lot number), and null when the typed lot number no longer matches the scanned batch. */
  onLabel: (label: DrumLabel | null) => void;
  error?: string | null;
  testID: string;
}

/** The lot number, typed or scanned from the drum label, with what else the label said. */
export const LotNumberField = forwardRef<TextInput, LotNumberFieldProps>(function LotNumberField({ value, onChangeText, label, onLabel, error, testID }, ref) {
  const input = useRef<TextInput>(null);
  useImperativeHandle(ref, () => input.current!);
  const type = (text: string) => {
    onChangeText(text);
    // The dates and GTIN belong to the scanned batch; a different lot number typed over it drops them.
    if (label?.batch && text.trim() !== label.batch) onLabel(null);
  };
  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        <View style={styles.input}>
          <TextField
            ref={input}
            label="Lot number"
            hint="As printed on the drum label, or scan its barcode."
            value={value}
            onChangeText={type}
            autoCapitalize="characters"
            autoCorrect={false}
            error={error}
            testID={testID}
          />
        </View>
        <ScanLabelButton testID={`${testID}-scan`} onScanned={onLabel} onCancel={() => setTimeout(() => input.current?.focus(), 0)} />
      </View>
      {label ? <ScannedLabel label={label} testID={`${testID}-label`} /> : null}
    </View>
  );
});

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', gap: space.sm, alignItems: 'flex-end' },
  input: { flex: 1, minWidth: 0 },
});
