import { In, type EntityManager } from 'typeorm';
import type { Role } from '../../shared/contract/roles';
import { Notification, User } from '../entities';
import { enqueueMail } from '../mail/outbox';
import type { NoticeRecord } from '../../shared/contract/notifications';
import { copyOf, type Sent } from '../common/json';

export interface Notice {
  kind: Notification['kind'];
  title: string;
  body: string;
  link?: string | null;
  /** Extra lines for the e-mail (what to order, for example). */
  lines?: string[];
}

/** An in-app notice and its e-mail (through the outbox), in the caller's transaction. */
async function deliver(m: EntityManager, user: User, notice: Notice): Promise<void> {
  await m.save(m.create(Notification, { userId: user.id, kind: notice.kind, title: notice.title, body: notice.body, link: notice.link ?? null, readAt: null }));
  await enqueueMail(m, user, notice);
}

/** Notices to every active user of the given roles (but the one who acted). */
export async function notifyRoles(m: EntityManager, roles: Role[], notice: Notice, exceptUserId?: string): Promise<number> {
  const users = await m.find(User, { where: { role: In(roles), active: true } });
  const targets = users.filter((u) => u.id !== exceptUserId);
  for (const u of targets) await deliver(m, u, notice);
  return targets.length;
}

export async function notifyUser(m: EntityManager, userId: string, notice: Notice): Promise<void> {
  const user = await m.findOneBy(User, { id: userId });
  if (user?.active) await deliver(m, user, notice);
}

export const notificationJson = (n: Notification) => copyOf(n, ['id', 'kind', 'title', 'body', 'link', 'readAt', 'createdAt']) satisfies Sent<NoticeRecord>;
