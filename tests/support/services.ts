import { Storage, storageConfigFromEnv } from '../../server/storage/storage';

// `npm test` starts the local S3 and mail stand-ins and passes their addresses in the environment.
export function testStorage(): Storage {
  const config = storageConfigFromEnv();
  if (!config) throw new Error('S3_BUCKET is not set: run these tests through `npm test`, which starts the local S3 stand-in.');
  return new Storage(config);
}

export function smtpUrl(): string {
  if (!process.env.SMTP_URL) throw new Error('SMTP_URL is not set: run these tests through `npm test`, which starts the local mail stand-in.');
  return process.env.SMTP_URL;
}

export interface InboxMessage {
  subject: string;
  text: string;
  html: string;
  to: Array<{ address: string }>;
}

/** Messages the local mail stand-in received (its web inbox's JSON API). */
export async function inbox(): Promise<InboxMessage[]> {
  const url = process.env.BUNGWISE_MAIL_WEB_URL;
  if (!url) throw new Error('BUNGWISE_MAIL_WEB_URL is not set: run these tests through `npm test`.');
  return (await fetch(`${url}/email`)).json() as Promise<InboxMessage[]>;
}

export async function clearInbox(): Promise<void> {
  await fetch(`${process.env.BUNGWISE_MAIL_WEB_URL}/email/all`, { method: 'DELETE' });
}
