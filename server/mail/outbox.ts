import type { EntityManager } from 'typeorm';
import { NOTICE_KINDS, type NoticeKind } from '../../shared/contract/notice-kinds';
import { OutboxMessage, type User } from '../entities';

export const MAIL_KINDS = NOTICE_KINDS;
export type MailKind = NoticeKind;

const escapeHtml = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

export function publicUrl(path: string | null | undefined): string {
  const base = (process.env.BUNGWISE_PUBLIC_URL ?? `http://localhost:${process.env.PORT ?? 8080}`).replace(/\/$/, '');
  return `${base}${path ?? '/'}`;
}

/** Mail about the account itself: always sent, since it cannot be turned off under Notices. */
export const ACCOUNT_MAIL_KINDS = ['password-reset'] as const;
export type AccountMailKind = (typeof ACCOUNT_MAIL_KINDS)[number];

const NOTICE_FOOTER = 'You get this because of your role in Bungwise; turn this kind of mail off under your notices.';

interface Letter {
  kind: MailKind | AccountMailKind;
  title: string;
  body: string;
  /** An app path, or a full address (a reset link carries its token). */
  link?: string | null;
  linkLabel?: string;
  lines?: string[];
  footer: string;
}

async function queue(m: EntityManager, user: Pick<User, 'id' | 'email' | 'displayName'>, letter: Letter): Promise<void> {
  const link = letter.link && /^https?:\/\//.test(letter.link) ? letter.link : publicUrl(letter.link);
  const label = letter.linkLabel ?? 'Open in Bungwise';
  const lines = letter.lines ?? [];
  const text = [`Hello ${user.displayName},`, '', letter.body, ...(lines.length ? ['', ...lines.map((l) => `- ${l}`)] : []), '', `${label}: ${link}`, '', letter.footer].join('\n');
  const html = `<!doctype html><html><body style="font-family:sans-serif;color:#1A2230">
<p>Hello ${escapeHtml(user.displayName)},</p>
<p>${escapeHtml(letter.body)}</p>
${lines.length ? `<ul>${lines.map((l) => `<li>${escapeHtml(l)}</li>`).join('')}</ul>` : ''}
<p><a href="${escapeHtml(link)}" style="color:#0B5563;font-weight:bold">${escapeHtml(label)}</a></p>
<p style="color:#4F5B69;font-size:13px">${escapeHtml(letter.footer)}</p>
</body></html>`;
  await m.save(
    m.create(OutboxMessage, {
      kind: letter.kind,
      toUserId: user.id,
      toEmail: user.email,
      subject: `[Bungwise] ${letter.title}`,
      textBody: text,
      htmlBody: html,
      status: 'pending',
      attempts: 0,
      lastError: null,
      nextAttemptAt: new Date(),
      sentAt: null,
    }),
  );
}

/**
 * Queues one e-mail in the caller's transaction: written with the event, sent later by the sender, so
 * a relay that is down loses nothing. Skipped when the person turned this kind of mail off.
 */
export async function enqueueMail(
  m: EntityManager,
  user: Pick<User, 'id' | 'email' | 'displayName' | 'mailOff'>,
  notice: { kind: MailKind; title: string; body: string; link?: string | null; lines?: string[] },
): Promise<boolean> {
  if ((user.mailOff ?? []).includes(notice.kind)) return false;
  await queue(m, user, { ...notice, footer: NOTICE_FOOTER });
  return true;
}

/** Queues mail about the person's own account (a reset link) in the caller's transaction, whatever their notice choices. */
export async function enqueueAccountMail(m: EntityManager, user: Pick<User, 'id' | 'email' | 'displayName'>, letter: Omit<Letter, 'kind'> & { kind: AccountMailKind }): Promise<void> {
  await queue(m, user, letter);
}
