import { DEFAULT_THEME, isThemeChoice, type ThemeChoice, type ThemeName } from '@/shared/themes';
import { browserBarColor, cssVarName, palettes, type ColorName, type Palette } from './palettes';

// The colour theme on the web: the three palettes as custom properties on the document root, chosen by the
// device's settings (media queries) unless the person chose one (`data-theme` on <html>). The choice is also
// kept on the device, so the sign-in screen follows the last one made there. Everything here is a no-op
// where there is no document (native), which keeps the light palette.

const STORAGE_KEY = 'bungwise.theme';
const STYLE_ID = 'bungwise-theme';
const SCHEME: Record<ThemeName, 'light' | 'dark'> = { light: 'light', dark: 'dark', contrast: 'light' };
const DARK_QUERY = '(prefers-color-scheme: dark)';
const CONTRAST_QUERY = '(prefers-contrast: more), (forced-colors: active)';

const declarations = (name: ThemeName): string => {
  const p: Palette = palettes[name];
  const vars = (Object.keys(p) as ColorName[]).map((k) => `${cssVarName(k)}:${p[k]};`).join('');
  return `color-scheme:${SCHEME[name]};${vars}`;
};

/** The style sheet: light by default, dark or high contrast by media query, any of them by `data-theme`. */
export function themeCss(): string {
  return [
    `:root{${declarations('light')}}`,
    `@media ${DARK_QUERY}{:root:not([data-theme]){${declarations('dark')}}}`,
    // After the dark rule, so a device asking for more contrast gets it in dark mode too.
    `@media ${CONTRAST_QUERY}{:root:not([data-theme]){${declarations('contrast')}}}`,
    ...(Object.keys(palettes) as ThemeName[]).map((n) => `:root[data-theme="${n}"]{${declarations(n)}}`),
    'html,body{background-color:var(--bw-paper);color:var(--bw-ink);}',
  ].join('\n');
}

const hasDocument = () => typeof document !== 'undefined' && typeof window !== 'undefined';
const matches = (query: string) => (typeof window.matchMedia === 'function' ? window.matchMedia(query).matches : false);

/** The palette a choice shows on this device now. */
export function resolveTheme(choice: ThemeChoice): ThemeName {
  if (choice !== 'system') return choice;
  if (!hasDocument()) return 'light';
  return matches(CONTRAST_QUERY) ? 'contrast' : matches(DARK_QUERY) ? 'dark' : 'light';
}

/** The choice last made on this device ('system' when none, or when storage cannot be read). */
export function storedThemeChoice(): ThemeChoice {
  try {
    const v = globalThis.localStorage?.getItem(STORAGE_KEY);
    return isThemeChoice(v) ? v : DEFAULT_THEME;
  } catch {
    return DEFAULT_THEME;
  }
}

let current: ThemeChoice = DEFAULT_THEME;

function apply(choice: ThemeChoice): void {
  current = choice;
  if (!hasDocument()) return;
  const root = document.documentElement;
  if (choice === 'system') root.removeAttribute('data-theme');
  else root.setAttribute('data-theme', choice);
  // The browser's own bar cannot read a custom property: it takes a plain colour.
  const bar = browserBarColor[resolveTheme(choice)];
  const metas = document.querySelectorAll('meta[name="theme-color"]');
  if (metas.length === 0) {
    const meta = document.createElement('meta');
    meta.name = 'theme-color';
    document.head.appendChild(meta);
    meta.content = bar;
  } else metas.forEach((m) => m.setAttribute('content', bar));
}

/** Shows a choice on this device now and keeps it there (it outlasts signing out). */
export function setDeviceTheme(choice: ThemeChoice): void {
  try {
    globalThis.localStorage?.setItem(STORAGE_KEY, choice);
  } catch {
    // Private mode or storage full: the choice then lasts until the tab closes.
  }
  apply(choice);
}

/** Once, before the first render: the style sheet, the device's last choice, and the bar colour kept current. */
export function installTheme(): void {
  if (!hasDocument() || document.getElementById(STYLE_ID)) return;
  const style = document.createElement('style');
  style.id = STYLE_ID;
  style.textContent = themeCss();
  document.head.appendChild(style);
  apply(storedThemeChoice());
  if (typeof window.matchMedia === 'function') {
    for (const q of [DARK_QUERY, CONTRAST_QUERY]) window.matchMedia(q).addEventListener?.('change', () => apply(current));
  }
}
