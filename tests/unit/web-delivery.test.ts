import fs from 'node:fs';
import path from 'node:path';
import { colors } from '../../components/theme';
import { FILE_REQUEST, isHashedFile } from '../../shared/web-delivery';

describe('which files browsers may keep for a year', () => {
  it('names that carry a content hash, and everything Expo writes under /_expo/static/', () => {
    for (const p of [
      '/_expo/static/js/web/entry-f11c62d5525bdef4e4ac5e2ff00b3dd7.js',
      '/_expo/static/css/base.css',
      '/assets/node_modules/@fontsource/source-sans-3/files/source-sans-3-latin-400-normal.27ab01c4cb5013775d870ae8accb1040.woff2',
      '/assets/node_modules/expo-router/assets/react-navigation/elements/close-icon.808e1b1b9b53114ec2838071a7e6daa7@2x.png',
      '/icons/icon-192.f06120e3f00c.png',
      '/_expo/static/js/web/entry-f11c62d5525bdef4e4ac5e2ff00b3dd7.js.br',
    ]) {
      expect([p, isHashedFile(p)]).toEqual([p, true]);
    }
  });

  it('not the files whose name stays the same across deploys', () => {
    for (const p of ['/index.html', '/sw.js', '/manifest.webmanifest', '/favicon.ico', '/metadata.json', '/index.html.br', '/icons/icon-192.png', '/assets/logo-v2.png']) {
      expect([p, isHashedFile(p)]).toEqual([p, false]);
    }
  });
});

describe('client routes and file requests', () => {
  it('a route gets the app; a request for a file does not', () => {
    expect(['/receive', '/receive/history', '/registry/drum-types/2b1c0e3a-1f4d-4c1a-9a55-7d1e2f3a4b5c'].filter((p) => FILE_REQUEST.test(p))).toEqual([]);
    expect(['/x.js', '/a/b.wasm', '/f.woff2', '/m.webmanifest'].every((p) => FILE_REQUEST.test(p))).toBe(true);
  });
});

describe('app.json and the theme', () => {
  // Expo reads the colours from app.json (index.html's theme-color); the theme is their home.
  it('app.json repeats the theme colours exactly', () => {
    const web = JSON.parse(fs.readFileSync(path.resolve(__dirname, '..', '..', 'app.json'), 'utf8')).expo.web;
    expect(web.themeColor).toBe(colors.primary);
    expect(web.backgroundColor).toBe(colors.paper);
    expect(web.splash.backgroundColor).toBe(colors.paper);
  });

  it('every image app.json names is in assets/', () => {
    const root = path.resolve(__dirname, '..', '..');
    const expo = JSON.parse(fs.readFileSync(path.join(root, 'app.json'), 'utf8')).expo;
    for (const p of [expo.icon, expo.web.favicon, expo.web.splash.image]) expect([p, fs.existsSync(path.join(root, p))]).toEqual([p, true]);
  });
});
