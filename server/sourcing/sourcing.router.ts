import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { body, parseQuery, refuseQuery } from '../common/validate';
import { parseId } from '../registry/resource';
import { SourcingPlanDto, WarningListDto } from './sourcing.dto';
import { SourcingService } from './sourcing.service';

export function sourcingRouter(ds: DataSource): Router {
  const service = new SourcingService(ds);
  const router = Router();
  const r = secured(router);
  r.get('/sourcing-plans', async (req, res) => {
    refuseQuery(req);
    res.json(await service.list());
  });
  r.get('/sourcing-plans/:id', async (req, res) => {
    res.json(await service.detail(parseId(req.params.id)));
  });
  r.post('/sourcing-plans', body(SourcingPlanDto), async (req, res) => {
    res.status(201).json(await service.create(req.body as SourcingPlanDto, req.user!.id));
  });
  r.get('/warnings', async (req, res) => {
    const q = await parseQuery(WarningListDto, req);
    res.json(await service.warnings(q.status));
  });
  r.post('/warnings/:id/acknowledge', async (req, res) => {
    res.json(await service.moveWarning(parseId(req.params.id), 'acknowledged', req.user!.id));
  });
  r.post('/warnings/:id/resolve', async (req, res) => {
    res.json(await service.moveWarning(parseId(req.params.id), 'resolved', req.user!.id));
  });
  return router;
}
