import type { ThemeName } from '@/shared/themes';

// The one home of the app's colours: three palettes with the same names. On the web every name becomes a
// CSS custom property (components/theme-css.ts) and `colors` holds `var(--bw-…)` strings; on native
// `colors` is the light palette itself. tests/unit/theme-contrast.test.ts checks every text/background pair
// in every palette. Plain #RRGGBB only: the contrast test and the browser's computed colours compare them.

export interface Palette {
  /** The page behind everything. */
  paper: string;
  /** Cards, inputs, the phone's top and bottom bars. */
  surface: string;
  /** Recessed or pressed areas: table heads, pressed buttons, the slurry in a drum drawing. */
  surfaceSunk: string;
  ink: string;
  inkMuted: string;
  /** A hovered table head (on `surfaceSunk`). */
  surfaceHover: string;
  /** Dividers and card borders (decorative: controls take `inkMuted` borders). */
  line: string;
  primary: string;
  primaryPressed: string;
  /** Text and marks on every filled colour: primary, danger and the verdict colours. */
  onPrimary: string;
  focus: string;
  danger: string;
  dangerSoft: string;
  // Verdicts: always shown with a word and a shape as well as the colour.
  fits: string;
  fitsSoft: string;
  caution: string;
  cautionSoft: string;
  noFit: string;
  noFitSoft: string;
  /** The wide screen's side bar, its text, its quieter text and its borders. */
  nav: string;
  onNav: string;
  onNavMuted: string;
  navLine: string;
}

export type ColorName = keyof Palette;

const light: Palette = {
  paper: '#F4F5F1',
  surface: '#FFFFFF',
  surfaceSunk: '#ECEEE8',
  surfaceHover: '#CDD2C8',
  ink: '#1A2230',
  inkMuted: '#4F5B69',
  line: '#CDD2C8',
  primary: '#0B5563',
  primaryPressed: '#083F4A',
  onPrimary: '#FFFFFF',
  focus: '#1E6FD9',
  danger: '#A3222B',
  dangerSoft: '#FBEAEA',
  fits: '#17663A',
  fitsSoft: '#E6F3EA',
  caution: '#8F5300',
  cautionSoft: '#FCF1DF',
  noFit: '#A3222B',
  noFitSoft: '#FBEAEA',
  nav: '#0B5563',
  onNav: '#FFFFFF',
  onNavMuted: '#D7E7EA',
  navLine: '#9CC3CA',
};

// Dark: light text on near-black blue-greys; the fills (primary, danger, verdicts) turn light, so the text
// on them (`onPrimary`) turns dark. The side bar stays dark rather than a wide band of bright teal.
const dark: Palette = {
  paper: '#12181E',
  surface: '#1B232C',
  surfaceSunk: '#0C1115',
  surfaceHover: '#2E3945',
  ink: '#E8ECEF',
  inkMuted: '#A8B3BE',
  line: '#3D4955',
  primary: '#6CC4D2',
  primaryPressed: '#96D8E2',
  onPrimary: '#0A1D22',
  focus: '#8AB8FF',
  danger: '#FF8F8F',
  dangerSoft: '#3B1C1F',
  fits: '#6FD39A',
  fitsSoft: '#14301F',
  caution: '#F0B25A',
  cautionSoft: '#372810',
  noFit: '#FF8F8F',
  noFitSoft: '#3B1C1F',
  nav: '#0A0E12',
  onNav: '#E8ECEF',
  onNavMuted: '#B4C0CA',
  navLine: '#56656F',
};

// High contrast: black on white, dark borders, the darkest verdict colours that still read as green,
// amber and red; black side bar. Also what `prefers-contrast: more` and forced colours get under 'system'.
const contrast: Palette = {
  paper: '#FFFFFF',
  surface: '#FFFFFF',
  surfaceSunk: '#EDEDED',
  surfaceHover: '#D4D4D4',
  ink: '#000000',
  inkMuted: '#2E2E2E',
  line: '#5C5C5C',
  primary: '#003D47',
  primaryPressed: '#00252B',
  onPrimary: '#FFFFFF',
  focus: '#0047C2',
  danger: '#8A0010',
  dangerSoft: '#FFE8E8',
  fits: '#004A1E',
  fitsSoft: '#E3F5E8',
  caution: '#5A3200',
  cautionSoft: '#FFF0D4',
  noFit: '#8A0010',
  noFitSoft: '#FFE8E8',
  nav: '#000000',
  onNav: '#FFFFFF',
  onNavMuted: '#E6E6E6',
  navLine: '#FFFFFF',
};

export const palettes: Record<ThemeName, Palette> = { light, dark, contrast };

/** The custom property that carries a colour on the web: `surfaceSunk` → `--bw-surface-sunk`. */
export const cssVarName = (name: ColorName): string => `--bw-${name.replace(/[A-Z]/g, (c) => `-${c.toLowerCase()}`)}`;

/** The browser's own bar (`<meta name="theme-color">`) in each theme. */
export const browserBarColor: Record<ThemeName, string> = { light: light.primary, dark: dark.nav, contrast: contrast.nav };
