import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { FitCheckService } from './fit-check.service';

export function fitCheckRouter(ds: DataSource): Router {
  const service = new FitCheckService(ds);
  const router = Router();
  const r = secured(router);
  r.post('/fit-checks', async (req, res) => {
    res.json(await service.check(req.body));
  });
  return router;
}
