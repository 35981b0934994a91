import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { body } from '../common/validate';
import { parseId } from '../registry/resource';
import { RinseDto, StandbyDto } from './rotation.dto';
import { RotationService } from './rotation.service';

/** Station floor actions: clerks (who run the dock and the drum positions), engineers and admins. */
export function rotationRouter(ds: DataSource): Router {
  const service = new RotationService(ds);
  const router = Router();
  const r = secured(router);
  r.get('/stations/:id/board', async (req, res) => {
    res.json(await service.board(parseId(req.params.id)));
  });
  r.post('/tube-sets/:id/rinse', body(RinseDto), async (req, res) => {
    const id = parseId(req.params.id);
    await service.rinse(id, req.body as RinseDto, req.user!.id);
    res.status(204).end();
  });
  r.post('/tube-sets/:id/standby', body(StandbyDto), async (req, res) => {
    await service.standby(parseId(req.params.id), req.body as StandbyDto, req.user!.id);
    res.status(204).end();
  });
  r.post('/stations/:id/change-out', async (req, res) => {
    await service.changeOut(parseId(req.params.id), req.user!.id);
    res.status(204).end();
  });
  return router;
}
