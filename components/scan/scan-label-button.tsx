import { useState, type ComponentType } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { DrumLabel } from '@/shared/gs1';
import { field, space } from '../theme';
import { Button } from '../ui/button';
import type { LabelScannerProps } from './label-scanner';

interface ScanLabelButtonProps {
  /** The label read: its batch is the lot number; GTIN, dates and serial come along for the lot's checks. */
  onScanned: (label: DrumLabel) => void;
  /** The scanner was closed without a label (the clerk types instead). */
  onCancel?: () => void;
  testID: string;
}

/**
 * "Scan label": opens the camera scanner. The scanner, the camera code and the decoder are fetched only on
 * the first press (a dynamic import, its own chunk in the web export), so the dock screen loads as before.
 */
export function ScanLabelButton({ onScanned, onCancel, testID }: ScanLabelButtonProps) {
  const [Scanner, setScanner] = useState<ComponentType<LabelScannerProps> | null>(null);
  const [open, setOpen] = useState(false);
  const [loading, setLoading] = useState(false);
  const [loadError, setLoadError] = useState<string | null>(null);

  const press = () => {
    setLoadError(null);
    if (Scanner) {
      setOpen(true);
      return;
    }
    setLoading(true);
    import('./label-scanner')
      .then((m) => {
        setScanner(() => m.LabelScanner);
        setOpen(true);
      })
      .catch(() => setLoadError('The scanner could not be loaded. Check the connection and try again, or type the lot number.'))
      .finally(() => setLoading(false));
  };

  return (
    <View style={styles.wrap}>
      <Button label="Scan label" variant="secondary" large busy={loading} onPress={press} testID={testID} />
      {loadError ? (
        <Text role="alert" style={field.error} testID={`${testID}-load-error`}>
          {loadError}
        </Text>
      ) : null}
      {open && Scanner ? (
        <Scanner
          testID={`${testID}-scanner`}
          onScanned={(label) => {
            setOpen(false);
            onScanned(label);
          }}
          onCancel={() => {
            setOpen(false);
            onCancel?.();
          }}
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
});
