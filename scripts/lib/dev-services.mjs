// Local stand-ins for object storage and SMTP (s3rver, maildev, in server/dev-services.ts) unless real ones
// are configured. Node built-ins only.
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { env, fail, freePort, portFree, root } from './launcher.mjs';

// Start mode uses fixed ports so the inbox address stays the same; test mode takes free ones.
async function servicePorts(mode) {
  if (mode === 'test') return { s3: await freePort(), smtp: await freePort(), web: await freePort() };
  const ports = { s3: Number(env.BUNGWISE_S3_PORT ?? 54330), smtp: Number(env.BUNGWISE_SMTP_PORT ?? 54331), web: Number(env.BUNGWISE_MAIL_WEB_PORT ?? 54332) };
  if (mode === 'start') {
    for (const [name, port] of [
      ['BUNGWISE_S3_PORT', ports.s3],
      ['BUNGWISE_SMTP_PORT', ports.smtp],
      ['BUNGWISE_MAIL_WEB_PORT', ports.web],
    ]) {
      if (!(await portFree(port))) fail(`Port ${port} is taken by another program: stop it or set ${name} to a free port.`);
    }
  }
  return ports;
}

// Each test run its own scratch store (runs may overlap); start mode keeps its files.
function storeDir(mode, dataDir) {
  const s3Dir = path.join(dataDir, mode === 'test' ? `s3-test-${process.pid}` : 's3');
  if (mode === 'test') {
    fs.rmSync(s3Dir, { recursive: true, force: true });
    process.on('exit', () => fs.rmSync(s3Dir, { recursive: true, force: true }));
  }
  return s3Dir;
}

/** The stand-ins' first JSON line on stdout (their addresses), or null when they exit or stay silent for 30 s. */
function whenReady(child) {
  return new Promise((resolve) => {
    let out = '';
    const timer = setTimeout(() => resolve(null), 30_000);
    child.stdout.on('data', (d) => {
      out += d;
      const line = out.split('\n').find((l) => l.startsWith('{'));
      if (line) {
        clearTimeout(timer);
        resolve(JSON.parse(line));
      }
    });
    child.on('exit', () => resolve(null));
  });
}

/** Starts the stand-ins that are needed; returns the child process and the environment that points the server at them. */
export async function startDevServices(mode, dataDir, extraEnv) {
  const wantS3 = !env.S3_BUCKET;
  const wantMail = !env.SMTP_URL;
  if (!wantS3 && !wantMail) return { child: null, env: {} };
  const ports = await servicePorts(mode);
  const s3Dir = storeDir(mode, dataDir);
  const child = spawn('node', [path.join(root, 'dist', 'server', 'server', 'dev-services.js')], {
    cwd: root,
    env: {
      ...env,
      ...extraEnv,
      BUNGWISE_S3_PORT: String(ports.s3),
      BUNGWISE_SMTP_PORT: String(ports.smtp),
      BUNGWISE_MAIL_WEB_PORT: String(ports.web),
      BUNGWISE_S3_DIR: s3Dir,
      S3_BUCKET: env.S3_BUCKET ?? 'bungwise',
    },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const ready = await whenReady(child);
  if (!ready) {
    child.kill('SIGTERM');
    fail('The local S3 and mail stand-ins would not start: see the message above, or set S3_BUCKET and SMTP_URL to real services.');
  }
  const out = {};
  if (wantS3) Object.assign(out, { S3_ENDPOINT: ready.s3, S3_BUCKET: 'bungwise', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER', S3_REGION: 'us-east-1' });
  if (wantMail) Object.assign(out, { SMTP_URL: ready.smtp, BUNGWISE_MAIL_WEB_URL: ready.inbox });
  return { child, env: out };
}
