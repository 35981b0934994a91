import { browserBarColor, cssVarName, palettes, type ColorName, type Palette } from '../../components/palettes';
import { colors } from '../../components/theme';
import { THEME_CHOICES } from '../../shared/themes';

// WCAG 2.x relative luminance and contrast ratio (W3C, "Web Content Accessibility Guidelines 2.1",
// definitions of relative luminance and contrast ratio) [pub]. Text pairs the app uses must reach 4.5:1
// (1.4.3); focus rings and control borders 3:1 against what they sit on (1.4.11) [pub].
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

/** Everything text sits on: the page, cards, recessed areas, and the soft backgrounds of verdicts and errors. */
const BACKGROUNDS: ColorName[] = ['paper', 'surface', 'surfaceSunk', 'fitsSoft', 'cautionSoft', 'noFitSoft', 'dangerSoft'];
/** Every colour text is drawn in on those backgrounds (verdict words sit beside rule lines, errors in cards). */
const TEXTS: ColorName[] = ['ink', 'inkMuted', 'primary', 'danger', 'fits', 'caution', 'noFit'];
/** Filled areas (buttons, badges, verdict marks, the selected option) and the one colour written on them. */
const FILLS: ColorName[] = ['primary', 'primaryPressed', 'danger', 'fits', 'caution', 'noFit'];

type Pair = [what: string, fg: ColorName, bg: ColorName];

const TEXT_PAIRS: Pair[] = [
  ...TEXTS.flatMap((fg) => BACKGROUNDS.map((bg): Pair => [`${fg} on ${bg}`, fg, bg])),
  ...FILLS.map((bg): Pair => [`onPrimary on ${bg}`, 'onPrimary', bg]),
  ['side bar text', 'onNav', 'nav'],
  ['side bar role line', 'onNavMuted', 'nav'],
  ['active side bar item', 'primary', 'surface'],
  // A hovered sortable table head: its name, the sorted column's name, and the sort arrow.
  ['table head on hover', 'ink', 'surfaceHover'],
  ['sorted table head on hover', 'primary', 'surfaceHover'],
  ['sort arrow on hover', 'inkMuted', 'surfaceHover'],
];

const NON_TEXT_PAIRS: Pair[] = [
  // The ring sits outside the control (outlineOffset 2) on any background, or inside a hovered table head.
  ...[...BACKGROUNDS, 'surfaceHover' as const].map((bg): Pair => [`focus ring on ${bg}`, 'focus', bg]),
  ...(['paper', 'surface', 'surfaceSunk'] as const).map((bg): Pair => [`control border (inkMuted) on ${bg}`, 'inkMuted', bg]),
  ['sign-out border in the side bar', 'navLine', 'nav'],
];

/** Hue in degrees, for telling the verdict colours apart by more than lightness. */
function hue(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255);
  const max = Math.max(r, g, b);
  const d = max - Math.min(r, g, b);
  if (d === 0) return 0;
  const h = max === r ? ((g - b) / d) % 6 : max === g ? (b - r) / d + 2 : (r - g) / d + 4;
  return (h * 60 + 360) % 360;
}
const hueApart = (a: string, b: string) => Math.min(Math.abs(hue(a) - hue(b)), 360 - Math.abs(hue(a) - hue(b)));

const themes = Object.entries(palettes) as Array<[string, Palette]>;

describe('theme contrast', () => {
  it('computes the published extremes: black on white is 21:1, a colour on itself 1:1', () => {
    expect(contrast('#000000', '#FFFFFF')).toBeCloseTo(21, 6); // WCAG 2.1: contrast ratio range 1:1 to 21:1 [pub]
    expect(contrast('#777777', '#777777')).toBeCloseTo(1, 6);
  });

  it('has a palette for every theme choice but "system", each colour a plain #RRGGBB', () => {
    expect(Object.keys(palettes).sort()).toEqual(THEME_CHOICES.filter((c) => c !== 'system').sort());
    for (const [, p] of themes) for (const v of Object.values(p)) expect(v).toMatch(/^#[0-9A-F]{6}$/);
  });

  it('checks every colour in some pair, so a new colour cannot skip the contrast test', () => {
    const checked = new Set([...TEXT_PAIRS, ...NON_TEXT_PAIRS].flatMap(([, fg, bg]) => [fg, bg]));
    const unchecked = (Object.keys(palettes.light) as ColorName[]).filter((k) => !checked.has(k) && k !== 'line');
    expect(unchecked).toEqual([]);
  });

  describe.each(themes)('%s palette', (_theme, p) => {
    it.each(TEXT_PAIRS)('%s reaches 4.5:1', (_what, fg, bg) => {
      expect(contrast(p[fg], p[bg])).toBeGreaterThanOrEqual(4.5);
    });

    it.each(NON_TEXT_PAIRS)('%s reaches 3:1', (_what, fg, bg) => {
      expect(contrast(p[fg], p[bg])).toBeGreaterThanOrEqual(3);
    });

    // Decorative borders are exempt from 1.4.11, but a card must still show its edge [practice].
    it.each(['paper', 'surface'] as const)('dividers (line) stay visible on %s, at least 1.3:1', (bg) => {
      expect(contrast(p.line, p[bg])).toBeGreaterThanOrEqual(1.3);
    });

    it('keeps the three verdict colours at least 30 degrees of hue apart (each also has its word and mark)', () => {
      expect(hueApart(p.fits, p.caution)).toBeGreaterThanOrEqual(30);
      expect(hueApart(p.caution, p.noFit)).toBeGreaterThanOrEqual(30);
      expect(hueApart(p.fits, p.noFit)).toBeGreaterThanOrEqual(30);
    });
  });

  it('names each colour once: native takes the light palette; the web a custom property per name', () => {
    // The unit tests load the native module (components/theme-colors.ts).
    expect(colors).toEqual(palettes.light);
    expect(cssVarName('surfaceSunk')).toBe('--bw-surface-sunk');
    expect(browserBarColor.light).toBe(palettes.light.primary);
  });
});
