import { secured } from '../auth/policy';
import { Router } from 'express';
import { IsNull, type DataSource } from 'typeorm';
import { notFound } from '../common/errors';
import { Notification } from '../entities';
import { refuseQuery } from '../common/validate';
import { parseId } from '../registry/resource';
import type { NoticeList } from '../../shared/contract/notifications';
import type { Sent } from '../common/json';
import { notificationJson } from './notifications.service';

/** Each user's own notices; nobody reads another's. */
export function notificationsRouter(ds: DataSource): Router {
  const router = Router();
  const r = secured(router);
  r.get('/notifications', async (req, res) => {
    refuseQuery(req);
    const repo = ds.getRepository(Notification);
    const [items, unread] = await Promise.all([
      repo.find({ where: { userId: req.user!.id }, order: { createdAt: 'DESC' }, take: 50 }),
      repo.count({ where: { userId: req.user!.id, readAt: IsNull() } }),
    ]);
    res.json({ items: items.map(notificationJson), unread } satisfies Sent<NoticeList>);
  });
  r.post('/notifications/:id/read', async (req, res) => {
    const repo = ds.getRepository(Notification);
    const n = await repo.findOneBy({ id: parseId(req.params.id), userId: req.user!.id });
    if (!n) throw notFound('Notice');
    if (!n.readAt) {
      n.readAt = new Date();
      await repo.save(n);
    }
    res.json(notificationJson(n));
  });
  r.post('/notifications/read-all', async (req, res) => {
    await ds.getRepository(Notification).update({ userId: req.user!.id, readAt: IsNull() }, { readAt: new Date() });
    res.status(204).end();
  });
  return router;
}
