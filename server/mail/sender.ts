import nodemailer, { type Transporter } from 'nodemailer';
import type { DataSource } from 'typeorm';
import { OutboxMessage } from '../entities';
import { ACCOUNT_MAIL_KINDS } from './outbox';

const ACCOUNT_KINDS = new Set<string>(ACCOUNT_MAIL_KINDS);
/** What is left of mail about an account once sent: its link carried a reset token, which is kept nowhere else. */
export const SENT_ACCOUNT_MAIL = '(sent; the link it carried is not kept)';

export interface SenderOptions {
  intervalMs?: number;
  /** First retry delay; doubles per attempt up to maxDelayMs. */
  baseDelayMs?: number;
  maxDelayMs?: number;
  from?: string;
}

export function transportFromEnv(env = process.env): Transporter | null {
  return env.SMTP_URL ? nodemailer.createTransport(env.SMTP_URL) : null;
}

/**
 * Delivers the outbox: picks due messages (skipping rows another sender holds), sends each, marks it
 * sent or schedules a retry with a growing delay. It keeps trying until the relay accepts.
 */
export class MailSender {
  private timer: NodeJS.Timeout | null = null;
  private running = false;

  constructor(
    private readonly ds: DataSource,
    private readonly transport: Transporter,
    private readonly options: SenderOptions = {},
  ) {}

  start(): void {
    if (this.timer) return;
    this.timer = setInterval(() => void this.flush().catch(() => undefined), this.options.intervalMs ?? 5000);
    this.timer.unref();
  }

  stop(): void {
    if (this.timer) clearInterval(this.timer);
    this.timer = null;
  }

  /** One pass over the due messages; returns how many were sent. */
  async flush(): Promise<number> {
    if (this.running || !this.ds.isInitialized) return 0;
    this.running = true;
    let sent = 0;
    try {
      await this.ds.transaction(async (m) => {
        const due = await m
          .getRepository(OutboxMessage)
          .createQueryBuilder('o')
          .where("o.status = 'pending' AND o.next_attempt_at <= now()")
          .orderBy('o.next_attempt_at', 'ASC')
          .limit(20)
          .setLock('pessimistic_write')
          .setOnLocked('skip_locked')
          .getMany();
        for (const msg of due) {
          try {
            await this.transport.sendMail({
              from: this.options.from ?? process.env.MAIL_FROM ?? 'Bungwise <bungwise@localhost>',
              to: msg.toEmail,
              subject: msg.subject,
              text: msg.textBody,
              html: msg.htmlBody,
            });
            msg.status = 'sent';
            msg.sentAt = new Date();
            msg.lastError = null;
            if (ACCOUNT_KINDS.has(msg.kind)) msg.textBody = msg.htmlBody = SENT_ACCOUNT_MAIL;
            sent++;
          } catch (err) {
            msg.attempts += 1;
            msg.lastError = String((err as Error).message ?? err).slice(0, 1000);
            const delay = Math.min(this.options.maxDelayMs ?? 5 * 60_000, (this.options.baseDelayMs ?? 5000) * 2 ** (msg.attempts - 1));
            msg.nextAttemptAt = new Date(Date.now() + delay);
          }
          await m.save(msg);
        }
      });
    } finally {
      this.running = false;
    }
    return sent;
  }
}
