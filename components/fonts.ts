import { FontDisplay, type FontSource } from 'expo-font';
import { fonts } from './theme';

// The three weights the theme uses, as Latin-subset woff2 (about 16 KB each instead of 380 KB TTFs).
// `swap`: text shows at once in the system font instead of staying invisible while a font loads; the
// export step does not preload them (on a slow link they would hold back the first screen's scripts).
const file = (uri: number): FontSource => ({ uri, display: FontDisplay.SWAP });

/* eslint-disable @typescript-eslint/no-require-imports -- Metro gives an asset's module id only through require() */
export const FONT_FILES: Record<string, FontSource> = {
  [fonts.regular]: file(require('@fontsource/source-sans-3/files/source-sans-3-latin-400-normal.woff2')),
  [fonts.semibold]: file(require('@fontsource/source-sans-3/files/source-sans-3-latin-600-normal.woff2')),
  [fonts.bold]: file(require('@fontsource/source-sans-3/files/source-sans-3-latin-700-normal.woff2')),
};
/* eslint-enable @typescript-eslint/no-require-imports */
