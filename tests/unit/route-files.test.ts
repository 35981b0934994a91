import fs from 'node:fs';
import path from 'node:path';
import { routeFilesFor } from '../../shared/route-files';

// The real route files, as Expo Router's route context names them.
const appDir = path.resolve(__dirname, '..', '..', 'app');
const keys = (function walk(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => (e.isDirectory() ? walk(path.join(dir, e.name)) : [`./${path.relative(appDir, path.join(dir, e.name))}`]));
})(appDir);

describe('routeFilesFor: the route files an address needs before its screen can show', () => {
  it('the dock check needs the root layout, both group layouts and its own screen', () => {
    expect(routeFilesFor('/receive', keys).sort()).toEqual(['./(app)/_layout.tsx', './(app)/receive/index.tsx', './(auth)/_layout.tsx', './_layout.tsx']);
  });

  it('a dynamic segment matches one segment, and a trailing slash or query changes nothing', () => {
    const lot = routeFilesFor('/receive/8f1c2e/', keys);
    expect(lot).toContain('./(app)/receive/[id].tsx');
    expect(lot).not.toContain('./(app)/receive/index.tsx');
    expect(lot).not.toContain('./(app)/receive/history.tsx');
  });

  it('a literal segment wins over nothing: /receive/history is the history screen (and [id] is a candidate too)', () => {
    const files = routeFilesFor('/receive/history', keys);
    expect(files).toContain('./(app)/receive/history.tsx');
  });

  it('home is the index of a group; not-found and unknown addresses ask for layouts only', () => {
    expect(routeFilesFor('/', keys)).toContain('./(app)/index.tsx');
    const unknown = routeFilesFor('/no/such/page', keys);
    expect(unknown.every((k) => k.endsWith('_layout.tsx'))).toBe(true);
    expect(unknown).not.toContain('./+not-found.tsx');
  });

  it('nested layouts are asked for only under their folder', () => {
    expect(routeFilesFor('/registry/drum-types', keys)).toContain('./(app)/registry/_layout.tsx');
    expect(routeFilesFor('/receive', keys)).not.toContain('./(app)/registry/_layout.tsx');
    expect(routeFilesFor('/registry/drum-types', keys)).toContain('./(app)/registry/drum-types/index.tsx');
  });

  it('catch-all segments take the rest of the path; a malformed escape is kept as typed', () => {
    const extra = [...keys, './(app)/docs/[...page].tsx'];
    expect(routeFilesFor('/docs/a/b/c', extra)).toContain('./(app)/docs/[...page].tsx');
    expect(routeFilesFor('/docs', extra)).not.toContain('./(app)/docs/[...page].tsx');
    expect(() => routeFilesFor('/receive/%E0%A4%A', keys)).not.toThrow();
  });
});
