import { palettes, type Palette } from './palettes';

// Native (and the unit tests): the light palette's own values. The web build takes theme-colors.web.ts.
export const colors: Palette = palettes.light;
