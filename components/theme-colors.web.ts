import { cssVarName, palettes, type ColorName, type Palette } from './palettes';
import { installTheme } from './theme-web';

// On the web every colour is a CSS custom property, set on the document root for the active theme
// (components/theme-web.ts), so styles made once by StyleSheet.create follow a change of theme without a
// re-render. react-native-web passes strings that start with `var(` straight to CSS.
// Not usable where a colour is computed on (alpha, blending, `${colors.x}33`): take `palettes` there.
export const colors = Object.fromEntries((Object.keys(palettes.light) as ColorName[]).map((name) => [name, `var(${cssVarName(name)})`])) as unknown as Palette;

installTheme();
