import 'reflect-metadata';
import cluster from 'node:cluster';
import path from 'node:path';
import { announce, EXIT_CANNOT_LISTEN } from './announce';
import { createApp } from './app';
import { jwtSecret } from './auth/tokens';
import { trustProxyFromEnv } from './common/security-headers';
import { makeDataSource } from './db/data-source';
import { closePreparedPool } from './db/prepared';
import { ChangeFeed } from './db/change-feed';
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

// Signed-in users and fit answers kept in memory until the database announces a change to their tables
// (BUNGWISE_KEEP=0 reads them on every request instead). The feed's connection runs either way: it is
// how `npm run db:restore` sees that this process uses the database, even while the pools are idle.
const feed = new ChangeFeed(process.env.DATABASE_URL!);
const changes = process.env.BUNGWISE_KEEP === '0' ? null : feed;

const app = createApp({
  changes,
  storage: storageConfig ? new Storage(storageConfig) : null,
  dataSource: ds,
  jwtSecret: jwtSecret(),
  webDir: process.env.BUNGWISE_WEB_DIR ?? path.resolve(__dirname, '..', '..', 'web'),
  logRequests: process.env.BUNGWISE_LOG_REQUESTS !== '0',
  publicUrl: process.env.BUNGWISE_PUBLIC_URL,
  trustProxy: trustProxyFromEnv(),
  allowedOrigins: (process.env.BUNGWISE_ALLOWED_ORIGINS ?? '')
    .split(',')
    .map((o) => o.trim())
    .filter(Boolean),
});

// One server process: run directly (BUNGWISE_WORKERS=1), or as a worker of the primary in server/index.ts.
// Listen at once (health answers "down" meanwhile), announce once the database is reachable.
const server = app.listen(port, () => {
  void connect().then(async () => {
    await feed.start();
    mailer?.start();
    // Under a primary (server/index.ts) the primary announces once for all workers.
    if (cluster.isWorker) process.send?.({ bungwise: 'ready' });
    else announce(port, 1);
  });
});
server.on('error', (err: NodeJS.ErrnoException) => {
  console.error(err.code === 'EADDRINUSE' ? `[bungwise] Port ${port} is taken: stop the other program or set PORT.` : `[bungwise] ${err.message}`);
  process.exit(EXIT_CANNOT_LISTEN);
});

let stopping = false;
function shutdown(): void {
  if (stopping) return;
  stopping = true;
  mailer?.stop();
  void feed.stop();
  server.close(() => {
    void Promise.allSettled([closePreparedPool(ds), ds.destroy()]).finally(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 5000).unref();
}
process.on('SIGTERM', shutdown);
process.on('SIGINT', shutdown);
