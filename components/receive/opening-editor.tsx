import { useState } from 'react';
import { Pressable, StyleSheet, Text, View } from 'react-native';
import type { LengthUnit } from '@/shared/units';
import { ApiError } from '../api/client';
import { keyCodeQueries, type KeyCodeRecord } from '../data/key-codes';
import { useLengthUnit } from '../data/me';
import { useThreadMatchMutation, type ThreadIdentification } from '../data/tools';
import { colors, fonts, minTouch, radius, space, type, field } from '../theme';
import { Button } from '../ui/button';
import { ChoiceChips } from '../ui/choice-chips';
import { NumberField, parseNumber } from '../ui/number-field';
import { RecordPicker, type PickedRef } from '../ui/record-picker';

/** One bung of a drum described at the dock. */
export interface OpeningDraft {
  key: string;
  label: string;
  threadCode: string | null;
  keyCode: PickedRef | null;
}

const LABELS = [
  { value: 'large bung', label: 'Large bung' },
  { value: 'small bung', label: 'Small bung' },
  { value: 'centre bung', label: 'Centre bung' },
] as const;

const FLANKS = [
  { value: 'none', label: 'Not measured' },
  { value: '55', label: '55°' },
  { value: '60', label: '60°' },
] as const;

const TAPERS = [
  { value: 'none', label: 'Not checked' },
  { value: 'parallel', label: 'Straight' },
  { value: 'tapered', label: 'Tapered' },
] as const;

interface OpeningEditorProps {
  index: number;
  value: OpeningDraft;
  onChange: (next: OpeningDraft) => void;
  onRemove?: () => void;
  /** The server's message for this opening's thread, if the check refused it. */
  error?: string | null;
  testID: string;
}

/**
 * A bung measured at the dock: caliper across the crests, a thread-gauge count and the flank angle go to the
 * thread identifier (POST /api/tools/thread-match); the clerk picks the thread it names. When two threads
 * fit what was measured, the answer says so and what to measure next.
 */
export function OpeningEditor({ index, value, onChange, onRemove, error, testID }: OpeningEditorProps) {
  const { unit: preferred } = useLengthUnit();
  const match = useThreadMatchMutation();
  const [diameter, setDiameter] = useState('');
  const [unit, setUnit] = useState<LengthUnit>(preferred);
  const [tpi, setTpi] = useState('');
  const [flank, setFlank] = useState<(typeof FLANKS)[number]['value']>('none');
  const [taper, setTaper] = useState<(typeof TAPERS)[number]['value']>('none');
  const [problems, setProblems] = useState<{ diameter?: string | null; tpi?: string | null }>({});
  const [answer, setAnswer] = useState<ThreadIdentification | null>(null);

  const identify = () => {
    const d = parseNumber(diameter);
    const t = parseNumber(tpi);
    const next = {
      diameter: d === null ? 'Enter the caliper reading across the thread crests.' : Number.isNaN(d) || d <= 0 ? 'Enter a number above 0, like 59.6.' : null,
      tpi: t !== null && (Number.isNaN(t) || t <= 0) ? 'Enter a count above 0, like 11.5, or leave it empty.' : null,
    };
    setProblems(next);
    if (next.diameter || next.tpi) return;
    match.mutate(
      {
        majorDiameter: { value: d!, unit },
        ...(t !== null ? { threadsPerInch: t } : {}),
        ...(flank !== 'none' ? { flankAngleDeg: Number(flank) } : {}),
        ...(taper !== 'none' ? { taper } : {}),
        // A bung is cut inside the drum's opening.
        side: 'internal',
      },
      {
        onSuccess: (res) => {
          setAnswer(res);
          // One thread fits: take it; several: the clerk chooses after measuring again.
          onChange({ ...value, threadCode: res.matches.length === 1 ? res.matches[0]!.code : null });
        },
        onError: (err) => {
          const f = err instanceof ApiError ? err.fieldMessages() : {};
          setProblems({ diameter: f['majorDiameter.value'] ? `Diameter ${f['majorDiameter.value']}.` : null, tpi: f.threadsPerInch ? `Threads per inch ${f.threadsPerInch}.` : null });
        },
      },
    );
  };

  return (
    <View style={styles.box} testID={testID}>
      <View style={styles.head}>
        <Text role="heading" aria-level={3} style={type.label}>
          Opening {index + 1}
        </Text>
        {onRemove ? <Button label={`Remove opening ${index + 1}`} variant="quiet" onPress={onRemove} testID={`${testID}-remove`} /> : null}
      </View>
      <ChoiceChips label="Which bung" options={LABELS} value={value.label as (typeof LABELS)[number]['value']} onChange={(label) => onChange({ ...value, label })} testID={`${testID}-label`} />
      <Text style={type.small}>Measure the bung's thread: a caliper across the crests, a thread gauge for the count and the flank angle.</Text>
      <NumberField
        label="Major diameter"
        hint="Caliper across the thread crests (at the large end if it narrows)."
        value={diameter}
        onChangeText={setDiameter}
        lengthUnit={unit}
        onLengthUnitChange={setUnit}
        placeholder={unit === 'in' ? 'e.g. 2.35' : 'e.g. 59.6'}
        error={problems.diameter}
        testID={`${testID}-diameter`}
      />
      <NumberField
        label="Threads per inch"
        hint="Thread gauge count; leave empty if not measured."
        value={tpi}
        onChangeText={setTpi}
        suffix="TPI"
        placeholder="e.g. 11"
        error={problems.tpi}
        testID={`${testID}-tpi`}
      />
      <ChoiceChips label="Flank angle" options={FLANKS} value={flank} onChange={setFlank} testID={`${testID}-flank`} />
      <ChoiceChips label="Taper (diameter at two points)" options={TAPERS} value={taper} onChange={setTaper} testID={`${testID}-taper`} />
      <Button label="Identify thread" variant="secondary" busy={match.isPending} onPress={identify} testID={`${testID}-identify`} />
      {match.isError && !problems.diameter && !problems.tpi ? (
        <Text role="alert" style={styles.error}>
          {match.error.message}
        </Text>
      ) : null}
      {answer ? <MatchAnswer answer={answer} chosen={value.threadCode} onChoose={(threadCode) => onChange({ ...value, threadCode })} testID={testID} /> : null}
      {error ? (
        <Text role="alert" style={styles.error} testID={`${testID}-error`}>
          {error}
        </Text>
      ) : null}
      <RecordPicker<KeyCodeRecord>
        label="Key collar"
        hint="The coloured collar on the bung, if there is one."
        source={keyCodeQueries}
        toOption={(k) => ({ id: k.code, label: `${k.code} — ${k.label}`, detail: k.marking ?? undefined })}
        value={value.keyCode}
        onChange={(picked) => onChange({ ...value, keyCode: picked })}
        noneLabel="No key collar"
        testID={`${testID}-key`}
      />
    </View>
  );
}

function MatchAnswer({ answer, chosen, onChoose, testID }: { answer: ThreadIdentification; chosen: string | null; onChoose: (code: string) => void; testID: string }) {
  const tone = answer.matches.length === 0 ? colors.noFit : answer.ambiguous ? colors.caution : colors.fits;
  const bg = answer.matches.length === 0 ? colors.noFitSoft : answer.ambiguous ? colors.cautionSoft : colors.fitsSoft;
  const head = answer.matches.length === 0 ? '✕ No thread in the table fits' : answer.ambiguous ? `! ${answer.matches.length} threads fit: measure again to tell them apart` : '✓ One thread fits';
  return (
    <View style={[styles.answer, { borderColor: tone, backgroundColor: bg }]} testID={`${testID}-answer`}>
      <Text style={[type.label, { color: tone }]} aria-live="polite">
        {head}
      </Text>
      <Text style={type.body} testID={`${testID}-advice`}>
        {answer.advice}
      </Text>
      {answer.matches.length ? (
        <View role="radiogroup" aria-label="Thread of this opening" style={styles.matches}>
          {answer.matches.map((m) => {
            const on = chosen === m.code;
            return (
              <Pressable
                key={m.code}
                role="radio"
                aria-checked={on}
                aria-label={`${m.nominalLabel}, ${m.standard}`}
                onPress={() => onChoose(m.code)}
                testID={`${testID}-match-${m.code}`}
                style={({ focused }: { pressed: boolean; focused?: boolean }) => [styles.match, on && styles.matchOn, focused && styles.focusRing]}
              >
                <Text style={[styles.matchTitle, on && styles.matchTitleOn]}>
                  {on ? '● ' : '○ '}
                  {m.nominalLabel} ({m.code})
                </Text>
                <Text style={[type.small, on && { color: colors.onPrimary }]}>
                  {m.standard}: {m.majorDiameterMm.toFixed(2)} mm, {m.threadsPerInch} per inch, {m.flankAngleDeg}°, {m.form === 'tapered' ? 'tapered' : 'straight'}
                </Text>
              </Pressable>
            );
          })}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, padding: space.md, borderWidth: 1, borderColor: colors.line, borderRadius: radius.md, backgroundColor: colors.paper },
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm },
  answer: { gap: space.sm, padding: space.md, borderWidth: 2, borderRadius: radius.md },
  matches: { gap: space.xs },
  match: { minHeight: minTouch, justifyContent: 'center', padding: space.sm, borderRadius: radius.md, borderWidth: 1.5, borderColor: colors.inkMuted, backgroundColor: colors.surface },
  matchOn: { backgroundColor: colors.primary, borderColor: colors.primary },
  matchTitle: { fontFamily: fonts.semibold, fontSize: 16, color: colors.ink },
  matchTitleOn: { color: colors.onPrimary },
  focusRing: { outlineColor: colors.focus, outlineWidth: 3, outlineStyle: 'solid', outlineOffset: 2 } as object,
  error: field.error,
});
