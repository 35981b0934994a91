import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import { Screen } from '../screen';
import { space } from '../theme';
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
  const resultRef = useRevealOnPhone(answer);
  return (
    <Screen
      title={title}
      subtitle={subtitle}
      testID={testID}
      columns={[
        form,
        <View ref={resultRef} style={styles.result} aria-live="polite">
          {result}
        </View>,
      ]}
      split={[formFlex, resultFlex]}
    />
  );
}

const styles = StyleSheet.create({
  result: { gap: space.lg },
});
