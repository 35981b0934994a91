import type { ReactNode } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ApiError } from '../api/client';
import { Screen } from '../screen';
import { space, type } from '../theme';
import { Card } from '../ui/card';
import { ErrorState } from '../ui/states';
import { useRevealOnPhone } from './use-reveal';

/** What a calculator's page reads of its mutation (TanStack Query's UseMutationResult fits). */
interface Calculation<T, V> {
  error: Error | null;
  data: T | undefined;
  variables: V | undefined;
  mutate: (input: V) => void;
}

interface ToolPageProps<T, V> {
  title: string;
  subtitle: string;
  testID: string;
  form: ReactNode;
  calc: Calculation<T, V>;
  renderAnswer: (answer: T, input: V) => ReactNode;
  /** What the answer side says before the first answer. */
  empty: { title: string; body: string };
  /** Relative widths of the form and the answer side by side on a wide screen. */
  flex: [form: number, result: number];
}

/**
 * A calculator page: the form, then the answer; side by side on a wide screen. A refusal of the input (400)
 * is shown at the form's fields; any other failure here, with a retry.
 */
export function ToolPage<T, V>({ title, subtitle, testID, form, calc, renderAnswer, empty, flex: [formFlex, resultFlex] }: ToolPageProps<T, V>) {
  // On a phone the latest answer is scrolled into view when it arrives.
  const resultRef = useRevealOnPhone(calc.data);
  let result;
  if (calc.error && !(calc.error instanceof ApiError && calc.error.status === 400)) {
    result = <ErrorState error={calc.error} onRetry={() => calc.variables && calc.mutate(calc.variables)} />;
  } else if (calc.data && calc.variables) {
    result = renderAnswer(calc.data, calc.variables);
  } else {
    result = (
      <Card>
        <Text style={type.label}>{empty.title}</Text>
        <Text style={type.body}>{empty.body}</Text>
      </Card>
    );
  }
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
