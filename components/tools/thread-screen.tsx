import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import type { LengthUnit } from '@/shared/units';
import { formatLength } from '@/shared/units';
import { ApiError } from '../api/client';
import { useLengthUnit } from '../data/me';
import { useThreadMatchMutation, type ThreadIdentification, type ThreadMatchInput } from '../data/tools';
import { TextLink } from '../registry/detail-parts';
import { colors, fonts, radius, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { parseNumber } from '../ui/number-field';
import { TextField } from '../ui/text-field';
import { positiveProblem } from './positive-problem';
import { ToolPage } from './tool-page';

type CountKind = 'tpi' | 'pitch';
type Flank = 'unknown' | '55' | '60';
type Taper = 'unknown' | 'tapered' | 'parallel';

const UNIT_OPTIONS = [
  { value: 'mm', label: 'mm' },
  { value: 'in', label: 'in' },
] as const;

const COUNT_KIND_OPTIONS = [
  { value: 'tpi', label: 'Threads per inch' },
  { value: 'pitch', label: 'Pitch in mm' },
] as const;
const FLANK_OPTIONS = [
  { value: 'unknown', label: 'Not measured' },
  { value: '55', label: '55°' },
  { value: '60', label: '60°' },
] as const;
const TAPER_OPTIONS = [
  { value: 'unknown', label: 'Not checked' },
  { value: 'tapered', label: 'Tapered' },
  { value: 'parallel', label: 'Parallel' },
] as const;

/** Identifies a bung or tube thread from what can be measured at the dock, and says what to measure next. */
export function ThreadScreen() {
  const reading = useThreadReading();
  return (
    <ToolPage
      title="Thread identifier"
      subtitle="Name a thread from a caliper reading and a gauge, before a dip tube is forced into the wrong bung."
      testID="tools-thread"
      form={<ThreadForm reading={reading} />}
      calc={reading.match}
      renderAnswer={(answer) => <ThreadResult answer={answer} />}
      empty={{
        title: 'No reading yet',
        body: 'Enter at least the diameter. Each extra measurement — count, flank angle, taper — rules out look-alike threads from other standards.',
      }}
      flex={[5, 6]}
    />
  );
}

/** The measurements as typed, their messages, and the request that names the thread. */
function useThreadReading() {
  const { unit: preferred } = useLengthUnit();
  const match = useThreadMatchMutation();
  const [diameter, setDiameter] = useState('');
  const [unit, setUnit] = useState<LengthUnit>(preferred);
  const [countKind, setCountKind] = useState<CountKind>('tpi');
  const [count, setCount] = useState('');
  const [flank, setFlank] = useState<Flank>('unknown');
  const [taper, setTaper] = useState<Taper>('unknown');
  const [errors, setErrors] = useState<Record<string, string | null>>({});

  const submit = () => {
    const d = parseNumber(diameter);
    const c = parseNumber(count);
    const problems = { diameter: positiveProblem(d, true), count: positiveProblem(c, false) };
    setErrors(problems);
    if (problems.diameter || problems.count) return;
    const input: ThreadMatchInput = {
      majorDiameter: { value: d!, unit },
      ...(c !== null ? (countKind === 'tpi' ? { threadsPerInch: c } : { pitchMm: c }) : {}),
      ...(flank !== 'unknown' ? { flankAngleDeg: Number(flank) } : {}),
      ...(taper !== 'unknown' ? { taper } : {}),
    };
    match.mutate(input, {
      onError: (err) => {
        if (err instanceof ApiError) {
          const f = err.fieldMessages();
          setErrors({ diameter: f['majorDiameter.value'] ?? f['majorDiameter.unit'] ?? null, count: f.threadsPerInch ?? f.pitchMm ?? null });
        }
      },
    });
  };

  return { match, submit, errors, diameter, setDiameter, unit, setUnit, countKind, setCountKind, count, setCount, flank, setFlank, taper, setTaper };
}

function ThreadForm({ reading: r }: { reading: ReturnType<typeof useThreadReading> }) {
  return (
    <Card testID="thread-form">
      <Text role="heading" aria-level={2} style={type.heading}>
        What you measured
      </Text>
      <View style={styles.pair}>
        <View style={styles.grow}>
          <TextField
            label="Major diameter (across the crests)"
            hint="Caliper reading; at the large end if the thread narrows."
            value={r.diameter}
            onChangeText={r.setDiameter}
            inputMode="decimal"
            placeholder={r.unit === 'in' ? 'e.g. 2.375' : 'e.g. 60.3'}
            error={r.errors.diameter}
            onSubmitEditing={r.submit}
            testID="thread-diameter"
          />
        </View>
        <ChoiceChips label="Unit" options={UNIT_OPTIONS} value={r.unit} onChange={r.setUnit} testID="thread-unit" />
      </View>
      <ChoiceChips label="Thread count, if measured" options={COUNT_KIND_OPTIONS} value={r.countKind} onChange={r.setCountKind} testID="thread-count-kind" />
      <TextField
        label={r.countKind === 'tpi' ? 'Threads per inch (optional)' : 'Pitch, mm (optional)'}
        hint="From a thread gauge; leave empty if not measured."
        value={r.count}
        onChangeText={r.setCount}
        inputMode="decimal"
        placeholder={r.countKind === 'tpi' ? 'e.g. 11.5' : 'e.g. 2.309'}
        error={r.errors.count}
        onSubmitEditing={r.submit}
        testID="thread-count"
      />
      <ChoiceChips label="Flank angle (optional)" options={FLANK_OPTIONS} value={r.flank} onChange={r.setFlank} testID="thread-flank" />
      <ChoiceChips label="Taper (optional)" options={TAPER_OPTIONS} value={r.taper} onChange={r.setTaper} testID="thread-taper" />
      <Button label="Identify the thread" onPress={r.submit} busy={r.match.isPending} testID="thread-submit" />
    </Card>
  );
}

function ThreadResult({ answer }: { answer: ThreadIdentification }) {
  const { matches, ambiguous, advice } = answer;
  const look =
    matches.length === 0
      ? { fg: colors.noFit, bg: colors.noFitSoft, mark: '✕' }
      : ambiguous
        ? { fg: colors.caution, bg: colors.cautionSoft, mark: '!' }
        : { fg: colors.fits, bg: colors.fitsSoft, mark: '✓' };
  const headline = matches.length === 0 ? 'No thread fits' : ambiguous ? `Ambiguous: ${matches.length} threads fit` : `Identified: ${matches[0]!.nominalLabel}`;
  return (
    <View style={styles.result} testID="thread-result">
      <View style={[styles.headline, { borderColor: look.fg, backgroundColor: look.bg }]} role="status" testID={ambiguous ? 'thread-ambiguous' : matches.length ? 'thread-identified' : 'thread-none'}>
        <View style={styles.headRow}>
          <View style={[styles.mark, { backgroundColor: look.fg }]}>
            <Text style={styles.markText} aria-hidden>
              {look.mark}
            </Text>
          </View>
          <Text style={[styles.headText, { color: look.fg }]}>{headline}</Text>
        </View>
        {ambiguous ? <Text style={type.body}>These measurements cannot tell them apart. Do not thread a tube in until one is left.</Text> : null}
      </View>
      <Card testID="thread-advice">
        <Text style={type.label}>{matches.length === 1 ? 'To be sure' : 'What to measure next'}</Text>
        <Text style={type.body}>{advice}</Text>
      </Card>
      {matches.length ? (
        <View role="list" aria-label="Candidate threads, best first" style={styles.candidates}>
          {matches.map((m, i) => (
            <View role="listitem" key={m.code}>
              <Card testID={`thread-candidate-${m.code}`}>
                <View style={styles.candHead}>
                  <Text style={styles.rank} aria-label={`Rank ${i + 1}`}>
                    {i + 1}
                  </Text>
                  <View style={styles.grow}>
                    <Text style={type.heading}>{m.nominalLabel}</Text>
                    <Text style={type.small}>
                      {m.code} · {m.standard}
                    </Text>
                  </View>
                </View>
                <View style={styles.facts}>
                  <Fact label="Major diameter" value={`${formatLength(m.majorDiameterMm, 'mm', 3)} (${formatLength(m.majorDiameterMm, 'in', 3)})`} />
                  <Fact label="Pitch" value={`${m.pitchMm.toFixed(3)} mm · ${Math.round(m.threadsPerInch * 100) / 100} per inch`} />
                  <Fact label="Flank angle" value={`${m.flankAngleDeg}°`} />
                  <Fact label="Form" value={m.form === 'tapered' ? 'Tapered' : 'Parallel'} />
                </View>
                <Text style={type.label}>Differences from your reading</Text>
                <View style={styles.facts}>
                  <Fact label="Diameter" value={`${formatLength(m.deltaMm, 'mm', 3)} (${formatLength(m.deltaMm, 'in', 4)})`} testID={`thread-delta-${m.code}`} />
                  <Fact label="Pitch" value={m.pitchDeltaMm !== undefined ? `${m.pitchDeltaMm.toFixed(3)} mm` : 'not measured'} />
                  <Fact label="Flank angle" value={m.flankDeltaDeg !== undefined ? `${m.flankDeltaDeg}°` : 'not measured'} />
                </View>
                <TextLink href={`/registry/drum-types?thread=${encodeURIComponent(m.code)}`} label={`Drum types with ${m.code} bungs`} />
              </Card>
            </View>
          ))}
        </View>
      ) : null}
    </View>
  );
}

function Fact({ label, value, testID }: { label: string; value: string; testID?: string }) {
  return (
    <View style={styles.fact}>
      <Text style={type.small}>{label}</Text>
      <Text style={type.body} testID={testID}>
        {value}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  pair: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md, alignItems: 'flex-start' },
  grow: { flex: 1, minWidth: 180 },
  result: { gap: space.md },
  headline: { borderWidth: 3, borderRadius: radius.lg, padding: space.lg, gap: space.sm },
  headRow: { flexDirection: 'row', alignItems: 'center', gap: space.md },
  mark: { width: 40, height: 40, borderRadius: 20, alignItems: 'center', justifyContent: 'center' },
  markText: { color: colors.onPrimary, fontFamily: fonts.bold, fontSize: 24, lineHeight: 28 },
  headText: { fontFamily: fonts.bold, fontSize: 26, lineHeight: 32, flexShrink: 1 },
  candidates: { gap: space.md },
  candHead: { flexDirection: 'row', gap: space.md, alignItems: 'center' },
  rank: { fontFamily: fonts.bold, fontSize: 22, color: colors.primary, width: 32, textAlign: 'center' },
  facts: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.sm },
  fact: { flexBasis: '40%', flexGrow: 1, minWidth: 130 },
});
