import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import Svg, { Circle, G, Line, Polyline, Text as SvgText } from 'react-native-svg';
import { meanVelocity } from '@/shared/flow';
import { flowToM3s, type FlowUnit } from '@/shared/units';
import { colors, fonts, space, type } from '../theme';

interface FlowPlotProps {
  /** The entered flow, in `unit`. */
  flow: number;
  unit: FlowUnit;
  feedBoreMm: number;
  returnBoreMm: number | null;
  testID?: string;
}

const HEIGHT = 240;
const PAD = { left: 56, right: 16, top: 16, bottom: 48 };
const SAMPLES = 21;

/** 1, 2 or 5 times a power of ten, so the axis reads in round numbers. */
function niceStep(span: number, ticks: number): number {
  const raw = span / ticks;
  const p = 10 ** Math.floor(Math.log10(raw));
  const m = raw / p;
  return (m <= 1 ? 1 : m <= 2 ? 2 : m <= 5 ? 5 : 10) * p;
}

const trim = (x: number): string => String(Number(x.toPrecision(4)));

/**
 * Port velocity against flow from zero to twice the entered flow, with the entered point marked. Velocities
 * come from the shared flow module (the same the server answers with), so the line and the numbers agree.
 */
export function FlowPlot({ flow, unit, feedBoreMm, returnBoreMm, testID }: FlowPlotProps) {
  const [width, setWidth] = useState(0);
  const velocityAt = (q: number, boreMm: number) => meanVelocity(flowToM3s(q, unit), boreMm / 1000);
  // The port the head sends slurry back through; a feed-only head has only the feed to show.
  const mainBore = returnBoreMm ?? feedBoreMm;
  const mainName = returnBoreMm != null ? 'Return' : 'Feed';
  const xMax = 2 * flow;
  const vMain = velocityAt(flow, mainBore);
  const vTop = Math.max(velocityAt(xMax, mainBore), velocityAt(xMax, feedBoreMm));
  const yStep = niceStep(vTop, 4);
  const yMax = Math.ceil(vTop / yStep) * yStep;
  const xStep = niceStep(xMax, 4);

  const plotW = Math.max(0, width - PAD.left - PAD.right);
  const plotH = HEIGHT - PAD.top - PAD.bottom;
  const x = (q: number) => PAD.left + (q / xMax) * plotW;
  const y = (v: number) => PAD.top + plotH - (v / yMax) * plotH;
  const series = (boreMm: number) =>
    Array.from({ length: SAMPLES }, (_, i) => {
      const q = (xMax * i) / (SAMPLES - 1);
      return `${x(q).toFixed(1)},${y(velocityAt(q, boreMm)).toFixed(1)}`;
    }).join(' ');
  const xTicks = Array.from({ length: Math.floor(xMax / xStep) + 1 }, (_, i) => i * xStep);
  const yTicks = Array.from({ length: Math.round(yMax / yStep) + 1 }, (_, i) => i * yStep);
  const summary = `${mainName} velocity against flow from 0 to ${trim(xMax)} ${unit}: a straight line through ${vMain.toFixed(2)} m/s at the entered ${trim(flow)} ${unit}.`;

  return (
    <View style={styles.wrap} testID={testID}>
      <View role="img" aria-label={summary} onLayout={(e) => setWidth(Math.round(e.nativeEvent.layout.width))} style={{ height: HEIGHT }}>
        {width > 0 ? (
          <Svg width={width} height={HEIGHT} aria-hidden>
            <G>
              {yTicks.map((v) => (
                <G key={`y${v}`}>
                  <Line x1={PAD.left} x2={PAD.left + plotW} y1={y(v)} y2={y(v)} stroke={colors.line} strokeWidth={1} />
                  <SvgText x={PAD.left - 6} y={y(v) + 4} fontSize={12} fontFamily={fonts.regular} fill={colors.inkMuted} textAnchor="end">
                    {trim(v)}
                  </SvgText>
                </G>
              ))}
              {xTicks.map((q) => (
                <G key={`x${q}`}>
                  <Line x1={x(q)} x2={x(q)} y1={PAD.top + plotH} y2={PAD.top + plotH + 5} stroke={colors.inkMuted} strokeWidth={1} />
                  <SvgText x={x(q)} y={PAD.top + plotH + 18} fontSize={12} fontFamily={fonts.regular} fill={colors.inkMuted} textAnchor="middle">
                    {trim(q)}
                  </SvgText>
                </G>
              ))}
              <Line x1={PAD.left} x2={PAD.left + plotW} y1={PAD.top + plotH} y2={PAD.top + plotH} stroke={colors.ink} strokeWidth={1.5} />
              <Line x1={PAD.left} x2={PAD.left} y1={PAD.top} y2={PAD.top + plotH} stroke={colors.ink} strokeWidth={1.5} />
              <SvgText x={PAD.left + plotW / 2} y={HEIGHT - 8} fontSize={13} fontFamily={fonts.semibold} fill={colors.ink} textAnchor="middle">
                {`Flow (${unit})`}
              </SvgText>
              <SvgText x={14} y={PAD.top + plotH / 2} fontSize={13} fontFamily={fonts.semibold} fill={colors.ink} textAnchor="middle" transform={`rotate(-90 14 ${PAD.top + plotH / 2})`}>
                Velocity (m/s)
              </SvgText>
              {returnBoreMm != null ? <Polyline points={series(feedBoreMm)} fill="none" stroke={colors.inkMuted} strokeWidth={2} strokeDasharray="6 5" /> : null}
              <Polyline points={series(mainBore)} fill="none" stroke={colors.primary} strokeWidth={3} />
              <Line x1={x(flow)} x2={x(flow)} y1={y(vMain)} y2={PAD.top + plotH} stroke={colors.caution} strokeWidth={1.5} strokeDasharray="3 3" />
              <Line x1={PAD.left} x2={x(flow)} y1={y(vMain)} y2={y(vMain)} stroke={colors.caution} strokeWidth={1.5} strokeDasharray="3 3" />
              <Circle cx={x(flow)} cy={y(vMain)} r={6} fill={colors.caution} stroke={colors.surface} strokeWidth={2} />
            </G>
          </Svg>
        ) : null}
      </View>
      <View style={styles.legend}>
        <LegendItem color={colors.primary} dashed={false} label={`${mainName} port, ${trim(mainBore)} mm bore`} />
        {returnBoreMm != null ? <LegendItem color={colors.inkMuted} dashed label={`Feed port, ${trim(feedBoreMm)} mm bore`} /> : null}
        <LegendItem color={colors.caution} dot label={`Your flow: ${trim(flow)} ${unit} gives ${vMain.toFixed(2)} m/s`} />
      </View>
    </View>
  );
}

function LegendItem({ color, dashed, dot, label }: { color: string; dashed?: boolean; dot?: boolean; label: string }) {
  return (
    <View style={styles.legendItem}>
      <Svg width={28} height={12} aria-hidden>
        {dot ? <Circle cx={14} cy={6} r={5} fill={color} /> : <Line x1={0} x2={28} y1={6} y2={6} stroke={color} strokeWidth={3} strokeDasharray={dashed ? '6 5' : undefined} />}
      </Svg>
      <Text style={type.small}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
});
