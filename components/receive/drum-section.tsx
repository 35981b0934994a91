import { useState } from 'react';
import { StyleSheet, Text, View } from 'react-native';
import Svg, { G, Line, Path, Rect, Text as SvgText } from 'react-native-svg';
import type { FitCheckResult } from '@/shared/contract/records';
import { recommendDipTubeLength } from '@/shared/recommend-length';
import { fromMm, type LengthUnit } from '@/shared/units';
import { useLengthUnit } from '../data/me';
import { colors, fonts, space, type } from '../theme';

/** A length for the drawing's labels: "15 mm", "12.5 mm", "0.59 in". */
function lengthText(mm: number, unit: LengthUnit): string {
  const v = fromMm(mm, unit);
  return unit === 'mm' ? `${Number(v.toFixed(1))} mm` : `${v.toFixed(2)} in`;
}

interface TubeInDrum {
  partNumber: string;
  /** Gap between the tube tip and the drum bottom, mm; negative when the tube is longer than the drum is deep. */
  gapMm: number;
  /** Index into the drum's openings of the bung the tube goes into. */
  openingIndex: number;
}

/**
 * The tube to draw: the best-ranked candidate that threads into one of the drum's bungs (a tube that does not
 * screw in has no place in the drawing), as its reach rule measured it, in the bung its thread rule names.
 */
export function tubeOf(result: FitCheckResult): TubeInDrum | null {
  for (const c of result.candidates) {
    const thread = c.rules.find((r) => r.rule === 'thread' && r.outcome === 'pass');
    const reach = c.rules.find((r) => r.rule === 'reach');
    if (!thread || typeof reach?.numbers?.gapMm !== 'number') continue;
    const named = result.drum.openings.findIndex((o) => !!o.label && thread.message.includes(o.label));
    return { partNumber: c.dipTubePartNumber, gapMm: reach.numbers.gapMm, openingIndex: Math.max(0, named) };
  }
  return null;
}

type TipPlace = 'inside' | 'too-high' | 'too-low';

function tipPlace(gapMm: number, min: number, max: number): TipPlace {
  if (gapMm > max) return 'too-high';
  if (gapMm < min) return 'too-low';
  return 'inside';
}

/** The sentence under the drawing, which also serves as its text alternative. */
export function tipSentence(tube: TubeInDrum, min: number, max: number, unit: LengthUnit): string {
  const window = `the ${lengthText(min, unit)} to ${lengthText(max, unit)} window`;
  const place = tipPlace(tube.gapMm, min, max);
  if (tube.gapMm <= 0) return `✕ Tube ${tube.partNumber} is ${lengthText(-tube.gapMm, unit)} longer than the drum is deep: it bottoms out, outside ${window}.`;
  const where = `Tip ${lengthText(tube.gapMm, unit)} above the bottom`;
  if (place === 'inside') return `✓ ${where}: inside ${window}.`;
  if (place === 'too-high') return `✕ ${where}: above ${window}, so slurry is left undrawn.`;
  return `✕ ${where}: below ${window}, so the tip sits on the bottom.`;
}

const MAIN_H = 300;
const TOP = 56;
const BOTTOM = 34;
/** Below this width the magnified detail goes under the drum instead of beside it. */
const SIDE_BY_SIDE = 560;
const DETAIL_H = 210;
/** The main section's width: beside the detail, or alone on a phone. */
const mainWidth = (width: number) => (width >= SIDE_BY_SIDE ? Math.min(width * 0.45, 300) : Math.min(width, 300));

interface SectionProps {
  width: number;
  result: FitCheckResult;
  tube: TubeInDrum | null;
  unit: LengthUnit;
}

/**
 * The drum in section: bungs on top, the inside depth, the dip tube down to its tip, and the tip-clearance
 * window above the bottom; beside it (or below it on a phone), the bottom of the drum magnified so the tip
 * and the window can be read.
 */
export function DrumSection({ result, testID = 'drum-section' }: { result: FitCheckResult; testID?: string }) {
  const [width, setWidth] = useState(0);
  const { unit } = useLengthUnit();
  const depth = result.drum.insideDepthMm;
  const { tipClearanceMinMm: min, tipClearanceMaxMm: max } = result.settings;
  const tube = tubeOf(result);
  const tipColour = tube && tipPlace(tube.gapMm, min, max) === 'inside' ? colors.fits : colors.noFit;
  const openings = result.drum.openings.slice(0, 3);
  const height = width >= SIDE_BY_SIDE ? MAIN_H : MAIN_H + DETAIL_H;

  const sentence = tube
    ? tipSentence(tube, min, max, unit)
    : (() => {
        const w = recommendDipTubeLength({ insideDepthMm: depth, tipClearanceMinMm: min, tipClearanceMaxMm: max });
        return `No registered tube threads into these bungs, so there is no tip to show. A tube for this drum would be ${lengthText(w.minLengthMm, unit)} to ${lengthText(w.maxLengthMm, unit)} long, seat to tip.`;
      })();
  const alt = `Drum in section, ${lengthText(depth, unit)} deep inside, openings ${openings.map((o) => o.label ?? o.threadCode ?? 'opening').join(' and ')}. ${sentence}`;

  return (
    <View style={styles.wrap} testID={testID}>
      <View role="img" aria-label={alt} onLayout={(e) => setWidth(Math.round(e.nativeEvent.layout.width))} style={{ height }}>
        {width > 0 ? (
          <Svg width={width} height={height} aria-hidden>
            <MainSection width={width} result={result} tube={tube} unit={unit} />
            <BottomDetail width={width} result={result} tube={tube} unit={unit} />
          </Svg>
        ) : null}
      </View>
      <Text style={[styles.sentence, { color: tube ? tipColour : colors.ink }]} testID={`${testID}-tip`}>
        {sentence}
      </Text>
      <View style={styles.legend}>
        <LegendSwatch fill={colors.fitsSoft} stroke={colors.fits} label={`Clearance window, ${lengthText(min, unit)} to ${lengthText(max, unit)} above the bottom`} />
        {tube ? <LegendSwatch fill={colors.primary} stroke={colors.primary} label={`Dip tube ${tube.partNumber}`} /> : null}
      </View>
    </View>
  );
}

/** The whole drum, to scale vertically: walls, floor, the window, the bungs with their threads, the tube and the depth. */
function MainSection({ width, result, tube, unit }: SectionProps) {
  const depth = result.drum.insideDepthMm;
  const { tipClearanceMinMm: min, tipClearanceMaxMm: max } = result.settings;
  const openings = result.drum.openings.slice(0, 3);
  const side = width >= SIDE_BY_SIDE;
  const mainW = mainWidth(width);
  const mainX = side ? 0 : Math.max(0, (width - mainW) / 2);
  const innerTop = TOP;
  const innerBottom = MAIN_H - BOTTOM;
  const scale = (innerBottom - innerTop) / depth;
  const drumW = Math.min(mainW - 56, (innerBottom - innerTop) * 0.68);
  const drumX = mainX + 44;
  const bungX = (i: number) => drumX + drumW * (openings.length === 1 ? 0.5 : i === 0 ? 0.28 : i === 1 ? 0.76 : 0.52);
  const yAbove = (mm: number) => innerBottom - mm * scale;
  const tubeX = tube ? bungX(Math.min(tube.openingIndex, openings.length - 1)) : 0;
  const bandTop = yAbove(max);
  const bandH = Math.max(4, (max - min) * scale);
  return (
    <>
      {/* Slurry inside the drum, the walls and the floor. */}
      <Rect x={drumX} y={innerTop + 22} width={drumW} height={innerBottom - innerTop - 22} fill={colors.surfaceSunk} />
      <Rect x={drumX} y={innerTop} width={drumW} height={innerBottom - innerTop} fill="none" stroke={colors.ink} strokeWidth={2.5} />
      <Line x1={drumX - 4} x2={drumX + drumW + 4} y1={innerTop} y2={innerTop} stroke={colors.ink} strokeWidth={3} />
      <Line x1={drumX - 4} x2={drumX + drumW + 4} y1={innerBottom} y2={innerBottom} stroke={colors.ink} strokeWidth={3} />
      {/* The clearance window, exaggerated to at least 4 px so it shows at this scale. */}
      <Rect x={drumX + 1.5} y={Math.min(bandTop, innerBottom - bandH)} width={drumW - 3} height={bandH} fill={colors.fitsSoft} stroke={colors.fits} strokeWidth={1} strokeDasharray="4 3" />
      {/* Bungs on the top head, with their threads. */}
      {openings.map((o, i) => {
        const x = bungX(i);
        const w = i === 0 ? 22 : 14;
        const label = o.threadCode ?? o.label ?? `opening ${i + 1}`;
        return (
          <G key={`${o.label ?? ''}-${i}`}>
            <Rect x={x - w / 2} y={innerTop - 9} width={w} height={9} fill={colors.surface} stroke={colors.ink} strokeWidth={2} />
            <SvgText x={x} y={innerTop - (i % 2 === 0 ? 34 : 20)} fontSize={12} fontFamily={fonts.semibold} fill={colors.ink} textAnchor="middle">
              {label}
            </SvgText>
          </G>
        );
      })}
      {/* The dip tube, from the head on its bung down to the tip. */}
      {tube ? (
        <G>
          <Rect x={tubeX - 9} y={innerTop - 18} width={18} height={9} fill={colors.primary} />
          <Line x1={tubeX} x2={tubeX} y1={innerTop - 9} y2={tube.gapMm <= 0 ? innerBottom : yAbove(tube.gapMm)} stroke={colors.primary} strokeWidth={5} />
          <Rect x={tubeX - 14} y={innerBottom - 30} width={28} height={34} fill="none" stroke={colors.inkMuted} strokeWidth={1} strokeDasharray="3 3" />
          <SvgText x={tubeX + 18} y={innerBottom - 20} fontSize={12} fontFamily={fonts.bold} fill={colors.inkMuted}>
            A
          </SvgText>
        </G>
      ) : null}
      {/* Inside depth. */}
      <Line x1={mainX + 20} x2={mainX + 20} y1={innerTop} y2={innerBottom} stroke={colors.inkMuted} strokeWidth={1.5} />
      <Line x1={mainX + 14} x2={mainX + 26} y1={innerTop} y2={innerTop} stroke={colors.inkMuted} strokeWidth={1.5} />
      <Line x1={mainX + 14} x2={mainX + 26} y1={innerBottom} y2={innerBottom} stroke={colors.inkMuted} strokeWidth={1.5} />
      <SvgText
        x={mainX + 12}
        y={(innerTop + innerBottom) / 2}
        fontSize={12}
        fontFamily={fonts.semibold}
        fill={colors.ink}
        textAnchor="middle"
        transform={`rotate(-90 ${mainX + 12} ${(innerTop + innerBottom) / 2})`}
      >
        {`${lengthText(depth, unit)} inside depth`}
      </SvgText>
      <SvgText x={drumX + drumW / 2} y={MAIN_H - 10} fontSize={12} fontFamily={fonts.regular} fill={colors.inkMuted} textAnchor="middle">
        drum bottom
      </SvgText>
    </>
  );
}

/** Detail A: the bottom of the drum magnified, with the window's edges and the tip (or why it is not shown). */
function BottomDetail({ width, result, tube, unit }: SectionProps) {
  const { tipClearanceMinMm: min, tipClearanceMaxMm: max } = result.settings;
  const place = tube ? tipPlace(tube.gapMm, min, max) : null;
  const tipColour = place === 'inside' ? colors.fits : colors.noFit;
  const side = width >= SIDE_BY_SIDE;
  const mainW = mainWidth(width);
  const detailX = side ? mainW + 16 : 0;
  const detailY = side ? 0 : MAIN_H + 4;
  const detailW = Math.max(0, width - detailX - 4);
  const rangeMm = Math.min(120, Math.max(40, max * 1.6, tube && tube.gapMm > 0 ? tube.gapMm * 1.35 : 0));
  const dTop = detailY + 56;
  const dBottom = detailY + (side ? MAIN_H - BOTTOM : DETAIL_H - 22);
  const dScale = (dBottom - dTop) / rangeMm;
  const dy = (mm: number) => dBottom - mm * dScale;
  const dTubeX = detailX + detailW * 0.56;
  const tipMm = tube ? Math.max(0, tube.gapMm) : 0;
  const tipOffDetail = tube ? tube.gapMm > rangeMm : false;
  if (detailW <= 160) return null;
  return (
    <G>
      <SvgText x={detailX} y={detailY + 18} fontSize={13} fontFamily={fonts.semibold} fill={colors.ink}>
        {tube ? 'Detail A: tip and window' : 'The window above the bottom'}
      </SvgText>
      <SvgText x={detailX} y={detailY + 34} fontSize={12} fontFamily={fonts.regular} fill={colors.inkMuted}>
        {`bottom ${lengthText(rangeMm, unit)}, magnified`}
      </SvgText>
      <Rect x={detailX} y={dy(max)} width={detailW} height={(max - min) * dScale} fill={colors.fitsSoft} />
      <Line x1={detailX} x2={detailX + detailW} y1={dy(max)} y2={dy(max)} stroke={colors.fits} strokeWidth={1.5} strokeDasharray="5 4" />
      <Line x1={detailX} x2={detailX + detailW} y1={dy(min)} y2={dy(min)} stroke={colors.fits} strokeWidth={1.5} strokeDasharray="5 4" />
      <SvgText x={detailX + 2} y={dy(max) - 5} fontSize={12} fontFamily={fonts.semibold} fill={colors.fits}>
        {`window top ${lengthText(max, unit)}`}
      </SvgText>
      <SvgText x={detailX + 2} y={dy(min) - 5} fontSize={12} fontFamily={fonts.semibold} fill={colors.fits}>
        {`window bottom ${lengthText(min, unit)}`}
      </SvgText>
      {/* Floor, hatched as a cut section. */}
      <Line x1={detailX} x2={detailX + detailW} y1={dBottom} y2={dBottom} stroke={colors.ink} strokeWidth={3} />
      {Array.from({ length: Math.floor(detailW / 12) }, (_, i) => (
        <Line key={i} x1={detailX + i * 12} x2={detailX + i * 12 + 10} y1={dBottom + 12} y2={dBottom + 2} stroke={colors.inkMuted} strokeWidth={1} />
      ))}
      {tube ? (
        <G>
          <Rect x={dTubeX - 10} y={dTop - 6} width={20} height={(tipOffDetail ? dTop + 16 : tube.gapMm <= 0 ? dBottom : dy(tipMm)) - (dTop - 6)} fill={colors.primary} />
          {tipOffDetail ? <Path d={`M ${dTubeX - 12} ${dTop + 30} L ${dTubeX} ${dTop + 18} L ${dTubeX + 12} ${dTop + 30}`} stroke={tipColour} strokeWidth={2.5} fill="none" /> : null}
          {tube.gapMm <= 0 ? (
            <Path d={`M ${dTubeX - 12} ${dBottom - 12} L ${dTubeX + 12} ${dBottom + 12} M ${dTubeX + 12} ${dBottom - 12} L ${dTubeX - 12} ${dBottom + 12}`} stroke={colors.noFit} strokeWidth={3} />
          ) : null}
          {/* Leader from the tip to its label. */}
          {!tipOffDetail && tube.gapMm > 0 ? (
            <G>
              <Line x1={dTubeX - 22} x2={dTubeX - 22} y1={dy(tipMm)} y2={dBottom} stroke={tipColour} strokeWidth={1.5} />
              <Line x1={dTubeX - 28} x2={dTubeX - 16} y1={dy(tipMm)} y2={dy(tipMm)} stroke={tipColour} strokeWidth={1.5} />
            </G>
          ) : null}
          <SvgText x={dTubeX + 16} y={tipOffDetail ? dTop + 28 : tube.gapMm <= 0 ? dBottom - 18 : dy(tipMm) + 4} fontSize={13} fontFamily={fonts.bold} fill={tipColour}>
            {tube.gapMm <= 0 ? '✕ bottoms out' : `${place === 'inside' ? '✓' : '✕'} tip ${lengthText(tube.gapMm, unit)}`}
          </SvgText>
        </G>
      ) : null}
    </G>
  );
}

function LegendSwatch({ fill, stroke, label }: { fill: string; stroke: string; label: string }) {
  return (
    <View style={styles.legendItem}>
      <Svg width={22} height={14} aria-hidden>
        <Rect x={1} y={1} width={20} height={12} fill={fill} stroke={stroke} strokeWidth={1.5} />
      </Svg>
      <Text style={type.small}>{label}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  sentence: { fontFamily: fonts.bold, fontSize: 17, lineHeight: 23 },
  legend: { flexDirection: 'row', flexWrap: 'wrap', columnGap: space.lg, rowGap: space.xs },
  legendItem: { flexDirection: 'row', alignItems: 'center', gap: space.xs, flexShrink: 1 },
});
