import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';

/** Health answers from a live query each time, so it reports recovery as soon as the database is back. */
export function healthRouter(ds: DataSource): Router {
  const router = Router();
  const r = secured(router);
  r.get('/health', async (_req, res) => {
    let db: 'ok' | 'down' = 'down';
    try {
      if (ds.isInitialized) {
        await Promise.race([ds.query('SELECT 1'), new Promise((_, reject) => setTimeout(() => reject(new Error('timeout')), 3000).unref())]);
        db = 'ok';
      }
    } catch {
      db = 'down';
    }
    res.status(db === 'ok' ? 200 : 503).json({ status: db === 'ok' ? 'ok' : 'degraded', db });
  });
  return router;
}
