// `npm run icons`: renders assets/ (the app icon, the web icons, favicons, the splash) from the artwork in
// icon-art.ts with Debian's Chromium. Run once after changing the artwork and commit the PNGs; the export
// step only copies them.
import fs from 'node:fs';
import path from 'node:path';
import { chromium } from 'playwright-core';
import { ICONS, SPLASH, markSvg } from './icon-art';

const root = path.resolve(__dirname, '..', '..', '..', '..');

async function main(): Promise<void> {
  const browser = await chromium.launch({ executablePath: process.env.BUNGWISE_CHROMIUM ?? '/usr/bin/chromium', args: ['--no-sandbox', '--disable-gpu'] });
  try {
    for (const icon of [...ICONS, SPLASH]) {
      const page = await browser.newPage({ viewport: { width: icon.size, height: icon.size }, deviceScaleFactor: 1 });
      await page.setContent(`<html><body style="margin:0;background:transparent">${markSvg(icon.art, icon.size)}</body></html>`);
      const out = path.join(root, 'assets', icon.file);
      fs.mkdirSync(path.dirname(out), { recursive: true });
      await page.locator('svg').screenshot({ path: out, omitBackground: icon.art.background === null });
      await page.close();
      console.log(`assets/${icon.file} (${icon.size} px)`);
    }
  } finally {
    await browser.close();
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
