import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { requireRole } from '../auth/guards';
import { body } from '../common/validate';
import { parseId } from '../registry/resource';
import { RinseDto, StandbyDto } from './rotation.dto';
import { RotationService } from './rotation.service';

/** Station floor actions: clerks (who run the dock and the drum positions), engineers and admins. */
export function rotationRouter(ds: DataSource): Router {
  const service = new RotationService(ds);
  const router = Router();
  const floor = requireRole('clerk', 'engineer', 'admin');
  router.get('/stations/:id/board', async (req, res) => {
    res.json(await service.board(parseId(req.params.id)));
  });
  router.post('/tube-sets/:id/rinse', floor, body(RinseDto), async (req, res) => {
    const id = parseId(req.params.id);
    await service.rinse(id, req.body as RinseDto, req.user!.id);
    res.status(204).end();
  });
  router.post('/tube-sets/:id/standby', floor, body(StandbyDto), async (req, res) => {
    await service.standby(parseId(req.params.id), req.body as StandbyDto);
    res.status(204).end();
  });
  router.post('/stations/:id/change-out', floor, async (req, res) => {
    await service.changeOut(parseId(req.params.id), req.user!.id);
    res.status(204).end();
  });
  return router;
}
