// Which chunk holds which route file, read from the export's entry bundle. With async routes the entry
// carries Expo Router's route context as a Metro module whose getters name each route file and the module
// it loads (`"./(app)/receive/index.tsx":{…get:()=>r(d[1])(d[8],d.paths)}`) and whose dependency map gives
// that module's chunk (`{"8":753,…,"paths":{"753":"/_expo/static/js/web/index-<hash>.js"}}`).
//
// Written to `route-chunks.json` so that the server can name an address's chunks in a `Link: rel=preload`
// header. Metro's output format is not a promise: when it changes, this finds nothing, the export says so,
// and `tests/api/web-delivery.test.ts` fails; the app itself still loads (only later).
import fs from 'node:fs';
import path from 'node:path';

const GETTER = /"(\.\/[^"]+\.[jt]sx?)":\{enumerable:!0,get:\(\)=>\w+\(\w+\[\d+\]\)\(\w+\[(\d+)\],\w+\.paths\)\}/g;
const DEPENDENCY_MAP = /\},\d+,(\{"0":\d+[^{}]*"paths":\{[^{}]*\}\})\);/g;

/** Route file (as the route context names it) to the URL of its chunk; empty when the bundle is not understood. */
export function routeChunks(bundle: string): Record<string, string> {
  const out: Record<string, string> = {};
  const getters = [...bundle.matchAll(GETTER)];
  if (getters.length === 0) return out;
  // The context module's dependency map is the first one after its getters.
  DEPENDENCY_MAP.lastIndex = getters[getters.length - 1].index ?? 0;
  const map = DEPENDENCY_MAP.exec(bundle);
  if (!map) return out;
  let deps: Record<string, number | Record<string, string>>;
  try {
    deps = JSON.parse(map[1]);
  } catch {
    return out;
  }
  const paths = deps.paths as Record<string, string>;
  for (const [, key, index] of getters) {
    const url = paths[String(deps[index])];
    if (typeof url === 'string' && url.startsWith('/_expo/static/js/')) out[key] = url;
  }
  return out;
}

/** Reads the bundles index.html starts and returns the route map of the one that holds the route context. */
export function readRouteChunks(webDir: string): Record<string, string> {
  const html = fs.readFileSync(path.join(webDir, 'index.html'), 'utf8');
  for (const [, src] of html.matchAll(/<script src="(\/_expo\/static\/js\/[^"]+\.js)"/g)) {
    const found = routeChunks(fs.readFileSync(path.join(webDir, src), 'utf8'));
    if (Object.keys(found).length > 0) return found;
  }
  return {};
}
