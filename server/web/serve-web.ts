import fs from 'node:fs';
import path from 'node:path';
import compression from 'compression';
import type { Express, Request, RequestHandler, Response } from 'express';
import expressStaticGzip from 'express-static-gzip';
import { notFound } from '../common/errors';
import { pathGuard } from '../common/input-guard';
import { routeFilesFor } from '../../shared/route-files';
import { COMPRESS_THRESHOLD_BYTES, FILE_REQUEST, ROUTE_CHUNKS_FILE, isHashedFile } from '../../shared/web-delivery';

const IMMUTABLE = 'public, max-age=31536000, immutable';
// index.html, the service worker, the manifest and other unhashed files: kept, but asked about each time
// (a 304 when unchanged), so a deploy reaches the next visit.
const REVALIDATE = 'no-cache';

/**
 * Compression of what is not compressed ahead of time (API JSON, CSV exports): brotli or gzip as the
 * client accepts, nothing under 1 KB. Files the export step compressed are served as they are (the
 * middleware leaves an answer that already has a Content-Encoding alone).
 */
export function compressAnswers(): RequestHandler {
  return compression({
    threshold: COMPRESS_THRESHOLD_BYTES,
    // A stream of server-sent events must reach the client as it is written, not when a buffer fills.
    filter: (req: Request, res: Response) => !String(res.getHeader('Content-Type') ?? '').startsWith('text/event-stream') && compression.filter(req, res),
  });
}

/**
 * The exported web app at `/`: each file with its brotli or gzip twin from the export step, hashed files
 * cached for a year, everything else revalidated; client routes (/receive, /registry/…) get index.html.
 * MIME types come from the file extension (mime-types: `.wasm` is application/wasm, `.webmanifest`
 * application/manifest+json).
 */
export function serveWeb(app: Express, webDir: string): void {
  const preload = routePreloads(webDir);
  const files = expressStaticGzip(webDir, {
    enableBrotli: true,
    orderPreference: ['br', 'gzip'],
    index: 'index.html',
    serveStatic: {
      cacheControl: false,
      setHeaders: (res, filePath) => {
        const urlPath = `/${path.relative(webDir, filePath).split(path.sep).join('/')}`;
        res.setHeader('Cache-Control', isHashedFile(urlPath) ? IMMUTABLE : REVALIDATE);
      },
    },
  });
  app.use(pathGuard);
  app.use(preload);
  app.use(files);
  app.get('/{*splat}', (req, res, next) => {
    if (FILE_REQUEST.test(req.path)) {
      next(notFound(`The file ${req.path}`));
      return;
    }
    req.url = '/index.html';
    files(req, res, next);
  });
}

/**
 * A page address (not a file by the same rule as the index.html fallback below, not the API) is answered with index.html and a `Link: rel=preload` header
 * naming the chunks of its layouts and screen (from the export's route-chunks.json), so they download
 * beside the entry bundle instead of one after another once it has run. Without the file, no header.
 */
function routePreloads(webDir: string): RequestHandler {
  let chunks: Record<string, string> = {};
  try {
    chunks = JSON.parse(fs.readFileSync(path.join(webDir, ROUTE_CHUNKS_FILE), 'utf8'));
  } catch {
    // An export from before the map existed: the app still loads its chunks itself.
  }
  const keys = Object.keys(chunks);
  return (req, res, next) => {
    if (keys.length > 0 && (req.method === 'GET' || req.method === 'HEAD') && !req.path.startsWith('/api/') && !FILE_REQUEST.test(req.path)) {
      // A few dozen route files against one address: microseconds, so worked out each time.
      const link = [...new Set(routeFilesFor(req.path, keys).map((k) => chunks[k]))].map((url) => `<${url}>; rel=preload; as=script`).join(', ');
      if (link) res.setHeader('Link', link);
    }
    next();
  };
}
