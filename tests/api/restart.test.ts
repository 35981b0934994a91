import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';

// `npm start` end to end, in its own data folder and ports: a user created while it runs is still there
// after Ctrl-C and a second start. The web export and the build are reused (the launcher skips them when
// unchanged), so this costs one initdb and two starts.
const root = path.resolve(__dirname, '..', '..');

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer();
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

function startLauncher(env: NodeJS.ProcessEnv): Promise<{ child: ChildProcess; output: () => string }> {
  const child = spawn('node', ['scripts/launch.mjs', 'start'], { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] });
  let out = '';
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (out += d));
  return new Promise((resolve, reject) => {
    const timer = setInterval(() => {
      if (out.includes('Bungwise is running at')) {
        clearInterval(timer);
        resolve({ child, output: () => out });
      }
    }, 200);
    child.on('exit', (code) => {
      clearInterval(timer);
      reject(new Error(`launcher exited with ${code}:\n${out}`));
    });
  });
}

function stopLauncher(child: ChildProcess): Promise<number | null> {
  return new Promise((resolve) => {
    child.removeAllListeners('exit');
    child.on('exit', (code) => resolve(code));
    child.kill('SIGINT');
  });
}

describe('npm start keeps data across a stop and a start', () => {
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'bungwise-restart-'));
  fs.chmodSync(dataDir, 0o755);

  afterAll(() => fs.rmSync(dataDir, { recursive: true, force: true }));

  it('prints the URL and the demo sign-ins, stops cleanly on Ctrl-C, and keeps a user created in between', async () => {
    const env: NodeJS.ProcessEnv = {
      ...process.env,
      BUNGWISE_DATA_DIR: dataDir,
      BUNGWISE_PG_PORT: String(await freePort()),
      PORT: String(await freePort()),
      BUNGWISE_S3_PORT: String(await freePort()),
      BUNGWISE_SMTP_PORT: String(await freePort()),
      BUNGWISE_MAIL_WEB_PORT: String(await freePort()),
      BUNGWISE_LOG_REQUESTS: '0',
      // Two server processes whatever the machine: the sign-in limit below must count across both (in the database).
      BUNGWISE_WORKERS: '2',
    };
    // A user's start: its own private cluster and local stand-ins, not the test run's.
    for (const k of ['DATABASE_URL', 'JWT_SECRET', 'S3_ENDPOINT', 'S3_BUCKET', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY', 'SMTP_URL', 'BUNGWISE_MAIL_WEB_URL']) delete env[k];
    const base = `http://127.0.0.1:${env.PORT}`;

    const first = await startLauncher(env);
    expect(first.output()).toContain('admin@bungwise.example');
    expect((await request(base).get('/api/health')).status).toBe(200);
    const signIn = await request(base).post('/api/auth/sign-in').send({ email: 'admin@bungwise.example', password: 'bungwise-demo' });
    const created = await request(base)
      .post('/api/users')
      .set('Authorization', `Bearer ${signIn.body.token}`)
      .send({ email: 'night.shift@bungwise.example', name: 'Ines Varga', role: 'clerk', temporaryPassword: 'copper-lantern-7' });
    expect(created.status).toBe(201);
    expect(await stopLauncher(first.child)).toBe(0);
    expect(first.output()).toContain('Stopping the PostgreSQL cluster');

    const second = await startLauncher(env);
    try {
      const again = await request(base).post('/api/auth/sign-in').send({ email: 'night.shift@bungwise.example', password: 'copper-lantern-7' });
      expect(again.status).toBe(200);
      // The demo scenario is not loaded twice.
      expect(second.output()).not.toContain('Loaded the demo scenario');
      expect(second.output()).toContain('(2 server processes)');
      // Eight failures are allowed per account; the ninth is refused, whichever process answers each one.
      const statuses: number[] = [];
      for (let i = 0; i < 9; i++) {
        statuses.push(
          (
            await request(base)
              .post('/api/auth/sign-in')
              .send({ email: 'night.shift@bungwise.example', password: `wrong-password-${i}` })
          ).status,
        );
      }
      expect(statuses).toEqual([...Array(8).fill(401), 429]);
    } finally {
      expect(await stopLauncher(second.child)).toBe(0);
    }
  }, 180_000);
});

describe('npm start failing at start-up', () => {
  it('says in one sentence that the port is taken, without a stack trace, and exits non-zero', async () => {
    const blocker = net.createServer();
    await new Promise<void>((resolve) => blocker.listen(0, '127.0.0.1', resolve));
    const port = (blocker.address() as net.AddressInfo).port;
    try {
      const env: NodeJS.ProcessEnv = { ...process.env, PORT: String(port) };
      const child = spawn('node', ['scripts/launch.mjs', 'start'], { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] });
      let out = '';
      child.stdout!.on('data', (d) => (out += d));
      child.stderr!.on('data', (d) => (out += d));
      const code = await new Promise<number | null>((resolve) => child.on('exit', resolve));
      expect(code).toBe(1);
      expect(out).toContain(`Port ${port} is taken by another program: stop it or set PORT to a free port.`);
      expect(out).not.toMatch(/\n\s+at /);
    } finally {
      blocker.close();
    }
  }, 60_000);
});
