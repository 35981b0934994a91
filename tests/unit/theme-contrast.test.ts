import { colors } from '../../components/theme';

// WCAG 2.x relative luminance and contrast ratio (W3C, "Web Content Accessibility Guidelines 2.1",
// definitions of relative luminance and contrast ratio) [pub]. Text pairs the app uses must reach 4.5:1.
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi + 0.05) / (lo + 0.05);
}

describe('theme contrast', () => {
  it('computes the published extremes: black on white is 21:1, a colour on itself 1:1', () => {
    expect(contrast('#000000', '#FFFFFF')).toBeCloseTo(21, 6); // WCAG 2.1: contrast ratio range 1:1 to 21:1 [pub]
    expect(contrast('#777777', '#777777')).toBeCloseTo(1, 6);
  });

  it.each([
    ['ink on paper', colors.ink, colors.paper],
    ['ink on surface', colors.ink, colors.surface],
    ['muted ink on surface', colors.inkMuted, colors.surface],
    ['muted ink on paper', colors.inkMuted, colors.paper],
    ['white on primary', colors.onPrimary, colors.primary],
    ['primary on surface', colors.primary, colors.surface],
    ['fits on its soft background', colors.fits, colors.fitsSoft],
    ['caution on its soft background', colors.caution, colors.cautionSoft],
    ['no fit on its soft background', colors.noFit, colors.noFitSoft],
    ['danger on surface', colors.danger, colors.surface],
    ['white on danger', colors.onPrimary, colors.danger],
  ])('%s reaches 4.5:1', (_name, fg, bg) => {
    expect(contrast(fg, bg)).toBeGreaterThanOrEqual(4.5);
  });
});
