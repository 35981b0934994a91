// The app's icons drawn from the Bungwise mark (components/ui/logo.tsx): a drum head seen from above,
// its rim, the large and the small bung, and the seam tab by the rim. Sizes here are in a 100-unit box.
import { colors } from '../../components/theme';

interface Art {
  /** Fill behind the mark; null for a transparent icon. */
  background: string | null;
  /** Rounded-square corner radius of the background (0 for full bleed). */
  corner: number;
  /** Diameter of the drum head's rim as a share of the box (a maskable icon keeps inside the 80% circle). */
  scale: number;
  ink: string;
  /** At 48 px and below the bungs' caps are left out: they would blur into a smudge. */
  detail: boolean;
}

export function markSvg(art: Art, size: number): string {
  const r = 34 * art.scale;
  const at = (v: number) => 50 + (v - 50) * art.scale;
  const bg = art.background ? `<rect width="100" height="100" rx="${art.corner}" fill="${art.background}"/>` : '';
  const hole = art.background ?? colors.primary;
  const caps = art.detail ? `<circle cx="${at(35.6)}" cy="${at(39.5)}" r="${3.6 * art.scale}" fill="${hole}"/><circle cx="${at(65.7)}" cy="${at(60.5)}" r="${2 * art.scale}" fill="${hole}"/>` : '';
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${size}" height="${size}" viewBox="0 0 100 100">${bg}
<circle cx="50" cy="50" r="${r}" stroke="${art.ink}" stroke-width="${6.5 * art.scale}" fill="none"/>
<circle cx="${at(35.6)}" cy="${at(39.5)}" r="${8.4 * art.scale}" fill="${art.ink}"/>
<circle cx="${at(65.7)}" cy="${at(60.5)}" r="${5.2 * art.scale}" fill="${art.ink}"/>
${caps}
<rect x="${at(44.8)}" y="${at(21.2)}" width="${10.5 * art.scale}" height="${5.2 * art.scale}" fill="${art.ink}"/></svg>`;
}

/** Each icon the app ships: file name under assets/, pixel size, artwork. */
export const ICONS: { file: string; size: number; art: Art }[] = [
  // The native app icon (app.json `icon`) and the web manifest's "any" icons: a teal tile.
  { file: 'icon.png', size: 1024, art: { background: colors.primary, corner: 22, scale: 1.05, ink: colors.onPrimary, detail: true } },
  { file: 'icons/icon-192.png', size: 192, art: { background: colors.primary, corner: 22, scale: 1.05, ink: colors.onPrimary, detail: true } },
  { file: 'icons/icon-512.png', size: 512, art: { background: colors.primary, corner: 22, scale: 1.05, ink: colors.onPrimary, detail: true } },
  // Maskable: full bleed, the mark inside the central 80% circle the launcher may crop to.
  { file: 'icons/maskable-512.png', size: 512, art: { background: colors.primary, corner: 0, scale: 0.82, ink: colors.onPrimary, detail: true } },
  // iOS draws its own rounded corners and shows transparency as black: full bleed, opaque.
  { file: 'icons/apple-touch-icon-180.png', size: 180, art: { background: colors.primary, corner: 0, scale: 0.95, ink: colors.onPrimary, detail: true } },
  // Favicons: the bare mark in the theme's teal on a transparent ground, thicker for its small size.
  { file: 'favicon.png', size: 48, art: { background: null, corner: 0, scale: 1.3, ink: colors.primary, detail: false } },
  { file: 'icons/favicon-32.png', size: 32, art: { background: null, corner: 0, scale: 1.3, ink: colors.primary, detail: false } },
];

/** The splash (app.json `splash` and `web.splash`): the mark on the page colour, room around it. */
export const SPLASH = { file: 'splash.png', size: 1024, art: { background: colors.paper, corner: 0, scale: 0.45, ink: colors.primary, detail: true } };
