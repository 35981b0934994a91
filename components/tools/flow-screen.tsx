import { useLocalSearchParams } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import { DEFAULT_TURBULENT_FROM, type PortFlow } from '@/shared/flow';
import { FLOW_UNITS, isFlowUnit, type FlowUnit } from '@/shared/units';
import { ApiError } from '../api/client';
import { useFlowMutation, type FlowAnswer, type FlowInput } from '../data/tools';
import { colors, fonts, space, type } from '../theme';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { ChoiceChips } from '../ui/choice-chips';
import { parseNumber } from '../ui/number-field';
import { TextField } from '../ui/text-field';
import { FlowPlot } from './flow-plot';
import { positiveProblem } from './positive-problem';
import { ToolPage } from './tool-page';

const FLOW_LABELS: Record<FlowUnit, string> = { 'L/min': 'L/min', 'gal/min': 'US gal/min', 'm3/h': 'm³/h' };
const REGIME_LABELS: Record<PortFlow['regime'], string> = { laminar: 'Laminar', transitional: 'Transitional', turbulent: 'Turbulent' };

const one = (p: string | string[] | undefined) => (Array.isArray(p) ? p[0] : p) ?? '';
const fmt = (x: number, digits: number) => x.toLocaleString('en-US', { maximumFractionDigits: digits, minimumFractionDigits: digits });

/** Velocities, wall shear rates and flow regimes in a dispense head's feed and return bores at one flow. */
export function FlowScreen() {
  // A connector's page opens this with its bores filled in: /tools/flow?feed=19.05&return=12.7
  const params = useLocalSearchParams<{ feed?: string; return?: string; flow?: string; unit?: string }>();
  const calc = useFlowMutation();
  const [flow, setFlow] = useState(one(params.flow));
  const [unit, setUnit] = useState<FlowUnit>(isFlowUnit(one(params.unit)) ? (one(params.unit) as FlowUnit) : 'L/min');
  const [feed, setFeed] = useState(one(params.feed));
  const [ret, setRet] = useState(one(params.return));
  const [errors, setErrors] = useState<Record<string, string | null>>({});

  const submit = () => {
    const q = parseNumber(flow);
    const f = parseNumber(feed);
    const r = parseNumber(ret);
    const problems = { flow: positiveProblem(q, true), feed: positiveProblem(f, true), ret: positiveProblem(r, false) };
    setErrors(problems);
    if (problems.flow || problems.feed || problems.ret) return;
    const input: FlowInput = { flow: { value: q!, unit }, feedBoreMm: f!, returnBoreMm: r };
    calc.mutate(input, {
      onError: (err) => {
        if (err instanceof ApiError) {
          const m = err.fieldMessages();
          setErrors({ flow: m['flow.value'] ?? m['flow.unit'] ?? null, feed: m.feedBoreMm ?? null, ret: m.returnBoreMm ?? null });
        }
      },
    });
  };

  const form = (
    <Card testID="flow-form">
      <Text role="heading" aria-level={2} style={type.heading}>
        Flow and ports
      </Text>
      <TextField label="Flow" value={flow} onChangeText={setFlow} inputMode="decimal" placeholder="e.g. 20" error={errors.flow} onSubmitEditing={submit} testID="flow-value" />
      <ChoiceChips label="Flow unit" options={FLOW_UNITS.map((u) => ({ value: u, label: FLOW_LABELS[u] }))} value={unit} onChange={setUnit} testID="flow-unit" />
      <BoreField label="Feed bore, mm" hint="3/4 in is 19.05 mm." value={feed} onChange={setFeed} placeholder="e.g. 19.05" error={errors.feed} onSubmit={submit} testID="flow-feed-bore" />
      <BoreField
        label="Return bore, mm (optional)"
        hint="Leave empty for a feed-only head. 1/2 in is 12.7 mm."
        value={ret}
        onChange={setRet}
        placeholder="e.g. 12.7"
        error={errors.ret}
        onSubmit={submit}
        testID="flow-return-bore"
      />
      <Button label="Calculate" onPress={submit} busy={calc.isPending} testID="flow-submit" />
    </Card>
  );

  return (
    <ToolPage
      title="Flow and shear"
      subtitle="How fast slurry moves through a dispense head's ports, and how hard it is sheared at the wall."
      testID="tools-flow"
      form={form}
      calc={calc}
      renderAnswer={(answer, input) => <FlowResult answer={answer} input={input} />}
      empty={{
        title: 'Nothing calculated yet',
        body: "Enter the station's flow and the head's bores. A narrower return runs faster than the feed at the same flow, which can spray and shear slurry back in the drum.",
      }}
      flex={[4, 7]}
    />
  );
}

interface BoreFieldProps {
  label: string;
  hint: string;
  value: string;
  onChange: (text: string) => void;
  placeholder: string;
  error: string | null | undefined;
  onSubmit: () => void;
  testID: string;
}

/** A port's bore in mm, typed as a decimal. */
function BoreField({ label, hint, value, onChange, placeholder, error, onSubmit, testID }: BoreFieldProps) {
  return <TextField label={label} hint={hint} value={value} onChangeText={onChange} inputMode="decimal" placeholder={placeholder} error={error} onSubmitEditing={onSubmit} testID={testID} />;
}

function FlowResult({ answer, input }: { answer: FlowAnswer; input: FlowInput }) {
  return (
    <View style={styles.result} testID="flow-result">
      <Card>
        <Text style={type.small}>At a flow of</Text>
        <Text style={type.heading} testID="flow-echo">
          {fmt(answer.flowLpm, 2)} L/min · {fmt(answer.flowGpm, 2)} US gal/min · {fmt(answer.flowM3h, 3)} m³/h
        </Text>
        {answer.velocityRatio !== undefined ? (
          <View style={styles.ratio}>
            <Text style={type.label}>Return to feed velocity ratio</Text>
            <Text style={styles.big} testID="flow-ratio">
              {fmt(answer.velocityRatio, 2)}
            </Text>
            <Text style={type.body}>
              {answer.velocityRatio > 1
                ? `The return runs ${fmt(answer.velocityRatio, 2)} times as fast as the feed: (feed bore ÷ return bore)².`
                : answer.velocityRatio < 1
                  ? 'The return is wider than the feed, so it runs slower.'
                  : 'Feed and return are the same bore, so they run at the same speed.'}
            </Text>
          </View>
        ) : (
          <Text style={type.body}>Feed-only head: the slurry returns through another opening, so there is no return port to compare.</Text>
        )}
      </Card>
      <View style={styles.ports}>
        <PortCard name="Feed" port={answer.feed} testID="flow-feed" />
        {answer.return ? <PortCard name="Return" port={answer.return} testID="flow-return" /> : null}
      </View>
      <Card testID="flow-plot-card">
        <Text role="heading" aria-level={2} style={type.heading}>
          {answer.return ? 'Return' : 'Feed'} velocity against flow
        </Text>
        <FlowPlot flow={input.flow.value} unit={input.flow.unit} feedBoreMm={input.feedBoreMm} returnBoreMm={input.returnBoreMm ?? null} testID="flow-plot" />
      </Card>
      <Text style={type.small}>
        Water at 20 °C. Laminar below a Reynolds number of {answer.laminarLimit} (the site's setting), turbulent above {DEFAULT_TURBULENT_FROM}. The wall shear rate 8v/D is exact only for laminar
        flow; in turbulent flow read it as an indication.
      </Text>
    </View>
  );
}

function PortCard({ name, port, testID }: { name: string; port: PortFlow; testID: string }) {
  return (
    <Card style={styles.port} testID={testID}>
      <Text role="heading" aria-level={2} style={type.heading}>
        {name} port · {fmt(port.boreMm, 2)} mm
      </Text>
      <Row label="Mean velocity" value={`${fmt(port.velocityMs, 3)} m/s`} testID={`${testID}-velocity`} />
      <Row label="Wall shear rate" value={`${fmt(port.shearRatePerS, 0)} 1/s`} testID={`${testID}-shear`} />
      <Row label="Reynolds number" value={fmt(port.reynolds, 0)} testID={`${testID}-reynolds`} />
      <Row label="Regime" value={REGIME_LABELS[port.regime]} testID={`${testID}-regime`} />
      {port.laminarPressureDropPaPerM !== null ? <Row label="Pressure drop (laminar)" value={`${fmt(port.laminarPressureDropPaPerM, 1)} Pa per metre`} /> : null}
    </Card>
  );
}

function Row({ label, value, testID }: { label: string; value: string; testID?: string }) {
  return (
    <View style={styles.row}>
      <Text style={[type.body, styles.rowLabel]}>{label}</Text>
      <Text style={[type.body, styles.rowValue]} testID={testID}>
        {value}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  result: { gap: space.md },
  ratio: { gap: space.xs, marginTop: space.sm },
  big: { fontFamily: fonts.bold, fontSize: 36, lineHeight: 42, color: colors.ink },
  ports: { flexDirection: 'row', flexWrap: 'wrap', gap: space.md },
  port: { flexGrow: 1, flexBasis: 260 },
  row: { flexDirection: 'row', justifyContent: 'space-between', gap: space.md, borderTopWidth: 1, borderTopColor: colors.line, paddingTop: space.xs },
  rowLabel: { color: colors.inkMuted, flexShrink: 1 },
  rowValue: { fontFamily: fonts.semibold, textAlign: 'right' },
});
