import { In, type EntityManager } from 'typeorm';
import type { Role } from '../../shared/roles';
import { Notification, User } from '../entities';

export interface Notice {
  kind: Notification['kind'];
  title: string;
  body: string;
  link?: string | null;
}

/** In-app notices to every active user of the given roles, written in the caller's transaction. */
export async function notifyRoles(m: EntityManager, roles: Role[], notice: Notice, exceptUserId?: string): Promise<number> {
  const users = await m.find(User, { where: { role: In(roles), active: true } });
  const targets = users.filter((u) => u.id !== exceptUserId);
  for (const u of targets) await m.save(m.create(Notification, { userId: u.id, ...notice, link: notice.link ?? null, readAt: null }));
  return targets.length;
}

export async function notifyUser(m: EntityManager, userId: string, notice: Notice): Promise<void> {
  await m.save(m.create(Notification, { userId, ...notice, link: notice.link ?? null, readAt: null }));
}

export const notificationJson = (n: Notification) => ({ id: n.id, kind: n.kind, title: n.title, body: n.body, link: n.link, readAt: n.readAt, createdAt: n.createdAt });
