import { StyleSheet, Text, View } from 'react-native';
import { space, type } from '../theme';
import { Button } from './button';

interface PagerProps {
  page: number;
  pageSize: number;
  total: number;
  onPage: (page: number) => void;
  /** What is being paged, plural: "dip tubes". */
  noun: string;
  busy?: boolean;
  testID?: string;
}

/** Previous / next through a server-paged list, with where you are in it. */
export function Pager({ page, pageSize, total, onPage, noun, busy = false, testID = 'pager' }: PagerProps) {
  const pages = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <View style={styles.row} role="navigation" aria-label={`Pages of ${noun}`} testID={testID}>
      <Text style={[type.small, styles.status]} aria-live="polite" testID={`${testID}-status`}>
        {total === 0 ? `No ${noun}` : `${first}–${last} of ${total} ${noun} · page ${page} of ${pages}`}
      </Text>
      {pages > 1 ? (
        <View style={styles.buttons}>
          <Button label="Previous page" variant="secondary" disabled={page <= 1 || busy} onPress={() => onPage(page - 1)} testID={`${testID}-prev`} />
          <Button label="Next page" variant="secondary" disabled={page >= pages || busy} onPress={() => onPage(page + 1)} testID={`${testID}-next`} />
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  status: { flexShrink: 1 },
  buttons: { flexDirection: 'row', gap: space.sm },
});
