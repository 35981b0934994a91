// The one theme file: colours, spacing, type and breakpoints. Colour pairs used for text meet 4.5:1.
export const colors = {
  paper: '#F4F5F1',
  surface: '#FFFFFF',
  surfaceSunk: '#ECEEE8',
  ink: '#1A2230',
  inkMuted: '#4F5B69',
  line: '#CDD2C8',
  primary: '#0B5563',
  primaryPressed: '#083F4A',
  onPrimary: '#FFFFFF',
  focus: '#1E6FD9',
  danger: '#A3222B',
  dangerSoft: '#FBEAEA',
  // Verdicts: always shown with a word and a shape as well as the colour.
  fits: '#17663A',
  fitsSoft: '#E6F3EA',
  caution: '#8F5300',
  cautionSoft: '#FCF1DF',
  noFit: '#A3222B',
  noFitSoft: '#FBEAEA',
} as const;

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
