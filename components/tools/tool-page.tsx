import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Screen } from '../screen';
import { space } from '../theme';
import { useIsWide } from '../use-layout';
import { useRevealOnPhone } from './use-reveal';

interface ToolPageProps {
  title: string;
  subtitle: string;
  testID: string;
  form: ReactNode;
  result: ReactNode;
  /** The latest answer: on a phone it is scrolled into view when it arrives. */
  answer: unknown;
  /** Relative widths of the form and the answer side by side on a wide screen. */
  formFlex: number;
  resultFlex: number;
}

/** A calculator page: the form, then the answer; side by side on a wide screen. */
export function ToolPage({ title, subtitle, testID, form, result, answer, formFlex, resultFlex }: ToolPageProps) {
  const wide = useIsWide();
  const resultRef = useRevealOnPhone(answer);
  return (
    <Screen title={title} subtitle={subtitle} testID={testID}>
      <View style={[styles.cols, wide && styles.colsWide]}>
        <View style={[styles.col, wide && { flex: formFlex, minWidth: 0 }]}>{form}</View>
        <View ref={resultRef} style={[styles.col, wide && { flex: resultFlex, minWidth: 0 }]} aria-live="polite">
          {result}
        </View>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  cols: { gap: space.lg },
  colsWide: { flexDirection: 'row', alignItems: 'flex-start' },
  col: { gap: space.lg },
});
