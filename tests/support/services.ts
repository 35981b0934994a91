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
export async function inbox(): Promise<InboxMessage[]> {
  const url = process.env.BUNGWISE_MAIL_WEB_URL;
  if (!url) throw new Error('BUNGWISE_MAIL_WEB_URL is not set: run these tests through `npm test`.');
  return (await fetch(`${url}/email`)).json() as Promise<InboxMessage[]>;
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
