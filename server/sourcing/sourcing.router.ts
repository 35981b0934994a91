import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../auth/guards';
import { body, parseDto } from '../common/validate';
import { parseId } from '../registry/resource';
import { SourcingPlanDto, WarningListDto } from './sourcing.dto';
import { SourcingService } from './sourcing.service';

export function sourcingRouter(ds: DataSource): Router {
  const service = new SourcingService(ds);
  const router = Router();
  const planners = requireRole('buyer', 'engineer', 'admin');
  router.get('/sourcing-plans', async (_req, res) => {
    res.json(await service.list());
  });
  router.get('/sourcing-plans/:id', async (req, res) => {
    res.json(await service.detail(parseId(req.params.id)));
  });
  router.post('/sourcing-plans', planners, body(SourcingPlanDto), async (req, res) => {
    res.status(201).json(await service.create(req.body as SourcingPlanDto, req.user!.id));
  });
  router.get('/warnings', async (req, res) => {
    const q = await parseDto(WarningListDto, { ...(req.query as object) });
    res.json(await service.warnings(q.status));
  });
  router.post('/warnings/:id/acknowledge', planners, async (req, res) => {
    res.json(await service.moveWarning(parseId(req.params.id), 'acknowledged', req.user!.id));
  });
  router.post('/warnings/:id/resolve', planners, async (req, res) => {
    res.json(await service.moveWarning(parseId(req.params.id), 'resolved', req.user!.id));
  });
  return router;
}
