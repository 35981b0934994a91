import type { EntityManager } from 'typeorm';
import { OutboxMessage, type User } from '../entities';

export const MAIL_KINDS = ['lot-held', 'hardware-gap', 'pairing-review', 'pairing-decision'] as const;
export type MailKind = (typeof MAIL_KINDS)[number];

export const MAIL_KIND_LABELS: Record<MailKind, string> = {
  'lot-held': 'A lot was put on hold at the dock',
  'hardware-gap': 'A sourcing plan or held lot needs hardware',
  'pairing-review': 'A pairing awaits your review',
  'pairing-decision': 'Your pairing was approved or rejected',
};

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

export function publicUrl(path: string | null | undefined): string {
  const base = (process.env.BUNGWISE_PUBLIC_URL ?? `http://localhost:${process.env.PORT ?? 8080}`).replace(/\/$/, '');
  return `${base}${path ?? '/'}`;
}

/**
 * Queues one e-mail in the caller's transaction: written with the event, sent later by the sender, so
 * a relay that is down loses nothing. Skipped when the person turned this kind of mail off.
 */
export async function enqueueMail(m: EntityManager, user: Pick<User, 'id' | 'email' | 'displayName' | 'mailOff'>, notice: { kind: MailKind; title: string; body: string; link?: string | null; lines?: string[] }): Promise<boolean> {
  if ((user.mailOff ?? []).includes(notice.kind)) return false;
  const link = publicUrl(notice.link);
  const lines = notice.lines ?? [];
  const text = [`Hello ${user.displayName},`, '', notice.body, ...(lines.length ? ['', ...lines.map((l) => `- ${l}`)] : []), '', `Open in Bungwise: ${link}`, '', 'You get this because of your role in Bungwise; turn this kind of mail off under your notices.'].join('\n');
  const html = `<!doctype html><html><body style="font-family:sans-serif;color:#1A2230">
<p>Hello ${escapeHtml(user.displayName)},</p>
<p>${escapeHtml(notice.body)}</p>
${lines.length ? `<ul>${lines.map((l) => `<li>${escapeHtml(l)}</li>`).join('')}</ul>` : ''}
<p><a href="${escapeHtml(link)}" style="color:#0B5563;font-weight:bold">Open in Bungwise</a></p>
<p style="color:#4F5B69;font-size:13px">You get this because of your role in Bungwise; turn this kind of mail off under your notices.</p>
</body></html>`;
  await m.save(m.create(OutboxMessage, { kind: notice.kind, toUserId: user.id, toEmail: user.email, subject: `[Bungwise] ${notice.title}`, textBody: text, htmlBody: html, status: 'pending', attempts: 0, lastError: null, nextAttemptAt: new Date(), sentAt: null }));
  return true;
}
