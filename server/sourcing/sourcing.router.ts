import { secured } from '../auth/policy';
import { Router } from 'express';
import { body, parseQuery, refuseQuery } from '../common/validate';
import { parseId } from '../registry/resource';
import { SourcingPlanDto, WarningListDto } from './sourcing.dto';
import type { SourcingService } from './sourcing.service';

export function sourcingRouter(service: SourcingService): Router {
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
