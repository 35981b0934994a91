import type { Express } from 'express';

export interface AppRoute {
  method: string;
  /** As registered under /api, e.g. "/dip-tubes/:id". */
  path: string;
  key: string;
}

interface Layer {
  route?: { path: string; methods: Record<string, boolean> };
  handle?: { stack?: Layer[] };
}

/** Every route the app's API router serves, read from the router itself (not from a list of ours). */
export function apiRoutes(app: Express): AppRoute[] {
  const out: AppRoute[] = [];
  const walk = (stack: Layer[]) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const [method, on] of Object.entries(layer.route.methods)) {
          if (on && method !== '_all') out.push({ method: method.toUpperCase(), path: layer.route.path, key: `${method.toUpperCase()} /api${layer.route.path}` });
        }
      } else if (layer.handle?.stack) walk(layer.handle.stack);
    }
  };
  walk((app.locals.apiRouter as { stack: Layer[] }).stack);
  return out;
}
