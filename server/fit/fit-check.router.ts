import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import type { Kept } from '../db/change-feed';
import { FitCheckService } from './fit-check.service';

export function fitCheckRouter(ds: DataSource, answers: Kept<Buffer> | null): Router {
  const service = new FitCheckService(ds, answers);
  const router = Router();
  const r = secured(router);
  r.post('/fit-checks', async (req, res) => {
    const { json, cache, stored } = await service.answer(req.body);
    // RFC 9211: whether the answer came from the answers kept since the registry last changed.
    res.set('Cache-Status', cache === 'hit' ? 'bungwise; hit' : `bungwise; fwd=${cache}${stored ? '; stored' : ''}`);
    res.type('json').send(json);
  });
  return router;
}
