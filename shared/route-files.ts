/**
 * Which route files of `app/` a web address needs: every layout on its way and the screen itself. Pure, so a
 * unit test can walk it: the app asks Expo Router for these at start
 * (`components/routing/preload-route.web.ts`) and the server names their chunks in a `Link` preload header
 * (`server/web/serve-web.ts`, from the `route-chunks.json` the export writes).
 *
 * Keys are the context's (`./(app)/receive/index.tsx`): groups in parentheses add no segment, `index` adds
 * none, `[id]` matches one segment and `[...rest]` the rest.
 */
export function routeFilesFor(pathname: string, keys: readonly string[]): string[] {
  const wanted = pathname.split('/').filter(Boolean).map(safeDecode);
  return keys.filter((key) => {
    const parts = key
      .replace(/^\.\//, '')
      .replace(/(\.web)?\.[tj]sx?$/, '')
      .split('/')
      .filter((p) => !/^\(.+\)$/.test(p));
    const last = parts[parts.length - 1];
    if (last === undefined || last.startsWith('+')) return false;
    if (last === '_layout') return matches(parts.slice(0, -1), wanted, true);
    return matches(last === 'index' ? parts.slice(0, -1) : parts, wanted, false);
  });
}

function matches(pattern: string[], path: string[], prefix: boolean): boolean {
  for (let i = 0; i < pattern.length; i++) {
    const p = pattern[i];
    if (/^\[\.\.\..+\]$/.test(p)) return path.length > i;
    if (i >= path.length) return false;
    if (!/^\[.+\]$/.test(p) && p !== path[i]) return false;
  }
  return prefix ? path.length >= pattern.length : path.length === pattern.length;
}

function safeDecode(segment: string): string {
  try {
    return decodeURIComponent(segment);
  } catch {
    return segment;
  }
}
