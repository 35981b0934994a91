// The one theme file: colours, spacing, type and breakpoints. Colour pairs used for text meet 4.5:1 in every
// palette (tests/unit/theme-contrast.test.ts).
import { colors } from './theme-colors';

/** Colour names for styles; the values live in palettes.ts (on the web they are `var(--bw-…)`, see there). */
export { colors };

export const space = { xs: 4, sm: 8, md: 12, lg: 16, xl: 24, xxl: 32 } as const;

export const radius = { sm: 4, md: 8, lg: 12 } as const;

export const fonts = {
  regular: 'SourceSans3_400Regular',
  semibold: 'SourceSans3_600SemiBold',
  bold: 'SourceSans3_700Bold',
} as const;

export const type = {
  title: { fontFamily: fonts.bold, fontSize: 28, lineHeight: 34, color: colors.ink },
  heading: { fontFamily: fonts.semibold, fontSize: 20, lineHeight: 26, color: colors.ink },
  body: { fontFamily: fonts.regular, fontSize: 16, lineHeight: 22, color: colors.ink },
  small: { fontFamily: fonts.regular, fontSize: 14, lineHeight: 19, color: colors.inkMuted },
  label: { fontFamily: fonts.semibold, fontSize: 15, lineHeight: 20, color: colors.ink },
} as const;

/** Below `wide` the app is one column with a bottom bar; at or above it, a side navigation. */
export const breakpoints = { wide: 900 } as const;
export const maxContentWidth = 1040;
/** Smallest tap target, px: 48 everywhere, since the dock and the stations are worked in chemical gloves. */
export const minTouch = 48;
/** Controls pressed in work gloves (the label scanner) are this tall at least: above the 48 px asked for gloves. */
export const gloveTouch = 56;

/** The one look of a text input, its error state, and the message under a field. */
export const field = {
  input: {
    minHeight: minTouch,
    borderWidth: 1.5,
    borderColor: colors.inkMuted,
    borderRadius: radius.md,
    paddingHorizontal: space.md,
    fontFamily: fonts.regular,
    fontSize: 17,
    color: colors.ink,
    backgroundColor: colors.surface,
  },
  inputError: { borderColor: colors.danger, borderWidth: 2 },
  error: { fontFamily: fonts.semibold, fontSize: 14, color: colors.danger },
} as const;
