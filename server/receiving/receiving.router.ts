import { secured } from '../auth/policy';
import { Router } from 'express';
import type { DataSource } from 'typeorm';
import { body, parseQuery } from '../common/validate';
import { parseId } from '../registry/resource';
import { HoldDto, ReceivingCheckDto, ReceivingListDto, ReleaseDto } from './receiving.dto';
import type { ReceivingService } from './receiving.service';
import { buildDockSnapshot } from './dock-snapshot';

export function receivingRouter(ds: DataSource, service: ReceivingService, clock?: () => Date): Router {
  const router = Router();
  const r = secured(router);
  // What a phone keeps to judge a lot offline; its revision is the ETag, so an unchanged registry costs a 304.
  r.get('/dock-snapshot', async (req, res) => {
    const snapshot = await buildDockSnapshot(ds, clock ? clock() : new Date());
    const etag = `"${snapshot.revision}"`;
    res.set('ETag', etag).set('Cache-Control', 'private, no-cache');
    if (req.get('If-None-Match') === etag) {
      res.status(304).end();
      return;
    }
    res.json(snapshot);
  });
  r.get('/receiving-checks', async (req, res) => {
    res.json(await service.list(await parseQuery(ReceivingListDto, req)));
  });
  r.get('/receiving-checks/:id', async (req, res) => {
    res.json(await service.detail(parseId(req.params.id)));
  });
  r.post('/receiving-checks', body(ReceivingCheckDto), async (req, res) => {
    const { check, replayed } = await service.create(req.body as ReceivingCheckDto, req.user!.id);
    res.status(replayed ? 200 : 201).json(check);
  });
  r.post('/receiving-checks/:id/hold', body(HoldDto), async (req, res) => {
    res.json(await service.hold(parseId(req.params.id), req.body as HoldDto, req.user!.id));
  });
  // Releasing a held or quarantined lot is an engineering decision.
  r.post('/receiving-checks/:id/release', body(ReleaseDto), async (req, res) => {
    res.json(await service.release(parseId(req.params.id), req.body as ReleaseDto, req.user!.id));
  });
  return router;
}
