// The colour themes a person can choose; kept per person on the server (PATCH /api/me {theme}) and on the
// device, so the sign-in screen follows the last choice made there. 'system' follows the device's own
// light/dark and contrast settings.
export const THEME_CHOICES = ['system', 'light', 'dark', 'contrast'] as const;
export type ThemeChoice = (typeof THEME_CHOICES)[number];
/** The palettes themselves (components/palettes.ts): every choice but 'system' names one. */
export type ThemeName = Exclude<ThemeChoice, 'system'>;

export const DEFAULT_THEME: ThemeChoice = 'system';

export const isThemeChoice = (v: unknown): v is ThemeChoice => typeof v === 'string' && (THEME_CHOICES as readonly string[]).includes(v);
