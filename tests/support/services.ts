import net from 'node:net';
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
/**
 * The local inbox. The relay accepts a message before its web view lists it (it parses after the SMTP reply), so a
 * test that has just sent `atLeast` messages waits, up to 5 s, until that many are listed.
 */
export async function inbox(atLeast = 0): Promise<InboxMessage[]> {
  const url = process.env.BUNGWISE_MAIL_WEB_URL;
  if (!url) throw new Error('BUNGWISE_MAIL_WEB_URL is not set: run these tests through `npm test`.');
  const until = Date.now() + 5000;
  for (;;) {
    const mail = (await (await fetch(`${url}/email`)).json()) as InboxMessage[];
    if (mail.length >= atLeast || Date.now() > until) return mail;
    await new Promise((r) => setTimeout(r, 50));
  }
}

export async function clearInbox(): Promise<void> {
  await fetch(`${process.env.BUNGWISE_MAIL_WEB_URL}/email/all`, { method: 'DELETE' });
}

/** Storage pointed at a loopback port nothing listens on: an object-store outage. */
export async function unreachableStorage(): Promise<Storage> {
  const config = testStorage().config;
  const server = net.createServer();
  const port = await new Promise<number>((resolve) => server.listen(0, '127.0.0.1', () => resolve((server.address() as net.AddressInfo).port)));
  await new Promise((resolve) => server.close(resolve));
  return new Storage({ ...config, endpoint: `http://127.0.0.1:${port}` });
}

/** Every key under a prefix in the store. */
export async function storedKeys(storage: Storage, prefix: string): Promise<string[]> {
  const keys: string[] = [];
  for await (const page of storage.list(prefix)) keys.push(...page.map((o) => o.key));
  return keys;
}
