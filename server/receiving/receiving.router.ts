import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../auth/guards';
import { body, parseDto } from '../common/validate';
import { parseId } from '../registry/resource';
import { HoldDto, ReceivingCheckDto, ReceivingListDto, ReleaseDto } from './receiving.dto';
import { ReceivingService } from './receiving.service';

export function receivingRouter(ds: DataSource): Router {
  const service = new ReceivingService(ds);
  const router = Router();
  const dock = requireRole('clerk', 'engineer', 'admin');
  router.get('/receiving-checks', async (req, res) => {
    res.json(await service.list(await parseDto(ReceivingListDto, { ...(req.query as object) })));
  });
  router.get('/receiving-checks/:id', async (req, res) => {
    res.json(await service.detail(parseId(req.params.id)));
  });
  router.post('/receiving-checks', dock, body(ReceivingCheckDto), async (req, res) => {
    res.status(201).json(await service.create(req.body as ReceivingCheckDto, req.user!.id));
  });
  router.post('/receiving-checks/:id/hold', dock, body(HoldDto), async (req, res) => {
    res.json(await service.hold(parseId(req.params.id), req.body as HoldDto, req.user!.id));
  });
  // Releasing a held lot is an engineering decision.
  router.post('/receiving-checks/:id/release', requireRole('engineer', 'admin'), body(ReleaseDto), async (req, res) => {
    res.json(await service.release(parseId(req.params.id), req.body as ReleaseDto, req.user!.id));
  });
  return router;
}
