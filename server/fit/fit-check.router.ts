import { secured } from '../auth/policy';
import { Router } from 'express';
import type { FitCheckService } from './fit-check.service';

/** POST /api/fit-checks, answered by the one fit service the app factory builds. */
export function fitCheckRouter(service: FitCheckService): Router {
  const router = Router();
  const r = secured(router);
  r.post('/fit-checks', async (req, res) => {
    const { json, cache, stored } = await service.answer(await service.parse(req.body));
    // RFC 9211: whether the answer came from the answers kept since the registry last changed.
    res.set('Cache-Status', cache === 'hit' ? 'bungwise; hit' : `bungwise; fwd=${cache}${stored ? '; stored' : ''}`);
    res.type('json').send(json);
  });
  return router;
}
