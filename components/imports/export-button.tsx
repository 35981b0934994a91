import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { ListParams } from '@/shared/contract/records';
import { saveFile } from '../api/download';
import { space, field } from '../theme';
import { Button } from '../ui/button';

interface ExportButtonProps {
  /** The registry table's path: "dip-tubes", "drum-types", … */
  resource: string;
  /** The list's search, filters and sort; paging is left out, the export holds every matching row. */
  params?: ListParams;
  label?: string;
  testID?: string;
}

function queryString(params: ListParams): string {
  const entries = Object.entries(params).filter(([k, v]) => k !== 'page' && k !== 'pageSize' && v !== undefined && v !== null && v !== '');
  return entries.length ? `?${entries.map(([k, v]) => `${k}=${encodeURIComponent(String(v))}`).join('&')}` : '';
}

/** Saves what a registry list shows, every page of it, as a CSV file. */
export function ExportButton({ resource, params = {}, label = 'Export CSV', testID = `export-${resource}` }: ExportButtonProps) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const save = () => {
    setBusy(true);
    setError(null);
    saveFile(`/exports/${resource}.csv${queryString(params)}`, `bungwise-${resource}.csv`)
      .catch((e: unknown) => setError(e instanceof Error ? e.message : 'The export could not be made.'))
      .finally(() => setBusy(false));
  };
  return (
    <View style={styles.wrap}>
      <Button label={label} variant="secondary" busy={busy} onPress={save} accessibilityLabel={`${label}: the rows this list shows`} testID={testID} />
      {error ? (
        <Text role="alert" style={styles.error} testID={`${testID}-error`}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs, alignItems: 'flex-start' },
  error: { ...field.error, maxWidth: 320 },
});
