import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { ApiError } from '../api/client';
import { useLengthUnit } from '../data/me';
import { usePackagingCodeQuery, type PackagingMark, type ParsedPackagingCode } from '../data/tools';
import { Screen } from '../screen';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ErrorState, LoadingState } from '../ui/states';
import { TextField } from '../ui/text-field';
import { useRevealOnPhone } from './use-reveal';

const EXAMPLES = ['1A1', '1A2', '1H1', '1H2', '31HA1', 'UN 1A1/Y1.4/150/24/NL/VL824'] as const;
const GROUP_LABELS: Record<ParsedPackagingCode['group'], string> = {
  single: 'Single packaging',
  composite: 'Composite packaging',
  ibc: 'Intermediate bulk container',
};

/** Reads the code part of a UN packaging mark (the 1A1 in "UN 1A1/Y1.4/150/…") in plain words. */
export function PackagingCodeScreen() {
  const params = useLocalSearchParams<{ code?: string }>();
  const initial = (Array.isArray(params.code) ? params.code[0] : params.code) ?? '';
  const [text, setText] = useState(initial);
  const [code, setCode] = useState<string | null>(initial.trim() || null);
  const [problem, setProblem] = useState<string | null>(null);
  const answer = usePackagingCodeQuery(code);
  const resultRef = useRevealOnPhone(answer.data ?? answer.error);

  const explain = (raw: string) => {
    const next = raw.trim();
    if (!next) {
      setProblem('Enter a packaging code, like 1A1.');
      return;
    }
    setProblem(null);
    setText(next);
    setCode(next);
  };

  let result;
  if (!code) {
    result = (
      <Card>
        <Text style={type.label}>No code yet</Text>
        <Text style={type.body}>The code is printed after the UN symbol on the drum's side or top: a kind numeral, a material letter and usually a category numeral.</Text>
      </Card>
    );
  } else if (answer.isPending) {
    result = <LoadingState label={`Reading ${code}…`} />;
  } else if (answer.isError) {
    // A 400 is the answer "this is not a packaging code"; anything else is a failure worth retrying.
    result =
      answer.error instanceof ApiError && answer.error.status === 400 ? (
        <View style={styles.invalid} role="alert" testID="packaging-error">
          <Text style={[type.label, { color: colors.danger }]}>Not a packaging code</Text>
          <Text style={type.body}>{answer.error.message}</Text>
        </View>
      ) : (
        <ErrorState error={answer.error} onRetry={() => answer.refetch()} />
      );
  } else {
    const p = answer.data;
    result = (
      <Card testID="packaging-result">
        <Text style={styles.code}>{p.code}</Text>
        <Text style={styles.explanation} testID="packaging-explanation">
          {p.explanation}
        </Text>
        <View role="list" aria-label="Parts of the code" style={styles.parts}>
          <Part mark={p.kind} what={p.group === 'ibc' ? 'Container type' : 'Kind'} meaning={p.kindLabel} />
          <Part mark={p.material} what={p.material.length > 1 ? 'Materials' : 'Material'} meaning={p.materialLabel} />
          {p.category !== null ? <Part mark={p.category} what="Category" meaning={p.categoryLabel ?? ''} /> : null}
        </View>
        <Text style={type.small}>{GROUP_LABELS[p.group]}.</Text>
        {p.mark ? <MarkParts mark={p.mark} /> : null}
      </Card>
    );
  }

  return (
    <Screen
      title="Packaging code"
      subtitle="What the UN packaging code on a drum says about its kind, material and head."
      testID="tools-packaging"
      columns={[
        <Card testID="packaging-form">
          <TextField
            label="UN packaging code"
            hint="Just the code, or the whole mark: UN 1A1/Y1.4/150/24/NL/VL824 is read part by part."
            value={text}
            onChangeText={setText}
            autoCapitalize="characters"
            autoCorrect={false}
            placeholder="e.g. 1A1"
            error={problem}
            onSubmitEditing={() => explain(text)}
            testID="packaging-code"
          />
          <Button label="Explain the code" onPress={() => explain(text)} busy={!!code && answer.isFetching} testID="packaging-submit" />
          <Text style={type.label}>Common on slurry drums</Text>
          <View style={styles.examples}>
            {EXAMPLES.map((e) => (
              <Button key={e} label={e} variant="secondary" accessibilityLabel={`Explain ${e}`} onPress={() => explain(e)} testID={`packaging-example-${e}`} />
            ))}
          </View>
        </Card>,
        <View ref={resultRef} style={styles.resultCol} aria-live="polite">
          {result}
        </View>,
      ]}
      split={[4, 6]}
    />
  );
}

/** The parts after the code; pressures and masses also in psi and lb for a person who works in inches. */
function MarkParts({ mark }: { mark: PackagingMark }) {
  const { unit } = useLengthUnit();
  const imperial = (part: string) => {
    if (unit !== 'in') return '';
    if (part === 'contents' && mark.testPressurePsi !== null) return ` (${mark.testPressurePsi.toFixed(1)} psi)`;
    if (part === 'performance' && mark.grossMassLb !== null) return ` (${mark.grossMassLb.toFixed(0)} lb)`;
    return '';
  };
  return (
    <View role="list" aria-label="Rest of the mark" style={styles.parts} testID="packaging-mark">
      {mark.parts
        .filter((m) => m.part !== 'code')
        .map((m) => (
          <Part key={m.part} mark={m.mark} what={MARK_PART_LABELS[m.part]} meaning={m.meaning + imperial(m.part)} />
        ))}
      {mark.notes.map((n) => (
        <Text key={n} style={type.small}>
          {n}
        </Text>
      ))}
    </View>
  );
}

const MARK_PART_LABELS: Record<PackagingMark['parts'][number]['part'], string> = {
  code: 'Code',
  performance: 'Packing groups and density or gross mass',
  contents: 'Test pressure or solids',
  year: 'Year of manufacture',
  state: 'State',
  maker: 'Maker',
  further: 'Further marks',
};

function Part({ mark, what, meaning }: { mark: string; what: string; meaning: string }) {
  return (
    <View role="listitem" style={styles.part}>
      <Text style={styles.partMark}>{mark}</Text>
      <View style={styles.partText}>
        <Text style={type.small}>{what}</Text>
        <Text style={type.body}>{meaning}</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  resultCol: { gap: space.lg },
  examples: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  invalid: { gap: space.sm, padding: space.lg, borderRadius: radius.md, backgroundColor: colors.dangerSoft, borderWidth: 1, borderColor: colors.danger },
  code: { fontFamily: fonts.bold, fontSize: 32, lineHeight: 38, color: colors.primary, letterSpacing: 1 },
  explanation: { fontFamily: fonts.semibold, fontSize: 18, lineHeight: 24, color: colors.ink },
  parts: { gap: space.sm, marginVertical: space.sm },
  part: { flexDirection: 'row', gap: space.md, alignItems: 'center' },
  partMark: {
    fontFamily: fonts.bold,
    fontSize: 20,
    color: colors.ink,
    minWidth: 56,
    textAlign: 'center',
    paddingVertical: space.xs,
    borderRadius: radius.sm,
    backgroundColor: colors.surfaceSunk,
    overflow: 'hidden',
  },
  partText: { flex: 1, minWidth: 0 },
});
