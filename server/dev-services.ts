import fs from 'node:fs';
// Local stand-ins for the hosted services, for `npm start` and `npm test` only: an S3-compatible store
// (s3rver) and an SMTP server with a web inbox (maildev), both on loopback. Real services replace them
// by setting S3_ENDPOINT/S3_BUCKET/credentials and SMTP_URL; nothing else changes.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const S3rver = require('s3rver');
// eslint-disable-next-line @typescript-eslint/no-require-imports
const MailDev = require('maildev');

async function main(): Promise<void> {
  const s3Port = Number(process.env.BUNGWISE_S3_PORT ?? 54330);
  const smtpPort = Number(process.env.BUNGWISE_SMTP_PORT ?? 54331);
  const webPort = Number(process.env.BUNGWISE_MAIL_WEB_PORT ?? 54332);
  const dir = process.env.BUNGWISE_S3_DIR ?? '.data/s3';
  fs.mkdirSync(dir, { recursive: true });
  const s3 = new S3rver({ port: s3Port, address: '127.0.0.1', silent: true, directory: dir, configureBuckets: [{ name: process.env.S3_BUCKET ?? 'bungwise' }] });
  await s3.run();
  const mail = new MailDev({ smtp: smtpPort, web: webPort, ip: '127.0.0.1', silent: true, noOpen: true });
  await new Promise<void>((resolve, reject) => mail.listen((err?: Error) => (err ? reject(err) : resolve())));
  console.log(JSON.stringify({ ready: true, s3: `http://127.0.0.1:${s3Port}`, smtp: `smtp://127.0.0.1:${smtpPort}`, inbox: `http://127.0.0.1:${webPort}` }));
  const stop = () => {
    void Promise.allSettled([s3.close(), new Promise((r) => mail.close(r))]).then(() => process.exit(0));
    setTimeout(() => process.exit(0), 3000).unref();
  };
  process.on('SIGTERM', stop);
  process.on('SIGINT', stop);
}

main().catch((err: Error) => {
  console.error(`[bungwise] the local S3 or mail stand-in would not start: ${err.message}`);
  process.exit(1);
});
