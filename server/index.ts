import 'reflect-metadata';
import path from 'node:path';
import { createApp } from './app';
import { jwtSecret } from './auth/tokens';
import { makeDataSource } from './db/data-source';
import { MailSender, transportFromEnv } from './mail/sender';
import { Storage, storageConfigFromEnv } from './storage/storage';

const port = Number(process.env.PORT ?? 8080);
const ds = makeDataSource();

/** Keeps trying to connect: the server starts answering (health says "down") before the database is up. */
async function connect(): Promise<void> {
  for (let attempt = 1; ; attempt++) {
    try {
      await ds.initialize();
      return;
    } catch (err) {
      if (attempt === 1) console.error(`[bungwise] database not reachable yet (${(err as Error).message}); retrying...`);
      await new Promise((r) => setTimeout(r, Math.min(5000, 500 * attempt)));
    }
  }
}

const storageConfig = storageConfigFromEnv();
const transport = transportFromEnv();
// The outbox sender runs beside the API; with several API processes each runs one (rows are claimed with SKIP LOCKED).
const mailer = transport ? new MailSender(ds, transport) : null;

const app = createApp({
  storage: storageConfig ? new Storage(storageConfig) : null,
  dataSource: ds,
  jwtSecret: jwtSecret(),
  webDir: process.env.BUNGWISE_WEB_DIR ?? path.resolve(__dirname, '..', '..', 'web'),
  logRequests: process.env.BUNGWISE_LOG_REQUESTS !== '0',
  allowedOrigins: (process.env.BUNGWISE_ALLOWED_ORIGINS ?? '').split(',').map((o) => o.trim()).filter(Boolean),
});

function announce(): void {
  const url = `http://localhost:${port}`;
  console.log(`\n[bungwise] Bungwise is running at ${url}`);
  if (process.env.BUNGWISE_DEMO !== '0') {
    console.log('[bungwise] Demo sign-ins (password bungwise-demo):');
    for (const role of ['clerk', 'engineer', 'engineer2', 'buyer', 'admin']) console.log(`[bungwise]   ${role.padEnd(9)} ${role}@bungwise.example`);
  }
  if (process.env.BUNGWISE_MAIL_WEB_URL) console.log(`[bungwise] Outgoing mail (local inbox): ${process.env.BUNGWISE_MAIL_WEB_URL}`);
  if (!storageConfig) console.log('[bungwise] File storage is off: set S3_BUCKET to keep attachments and imported files.');
  if (!transport) console.log('[bungwise] E-mail is off: set SMTP_URL to send notices by mail.');
  console.log('[bungwise] Press Ctrl-C to stop.\n');
}

// Listen at once (health answers "down" meanwhile), announce once the database is reachable.
const server = app.listen(port, () => {
  void connect().then(() => {
    mailer?.start();
    announce();
  });
});
server.on('error', (err: NodeJS.ErrnoException) => {
  console.error(err.code === 'EADDRINUSE' ? `[bungwise] Port ${port} is taken: stop the other program or set PORT.` : `[bungwise] ${err.message}`);
  process.exit(1);
});

function shutdown(): void {
  mailer?.stop();
  server.close(() => {
    void ds.destroy().finally(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 5000).unref();
}
process.on('SIGTERM', shutdown);
process.on('SIGINT', shutdown);
