import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';

const root = path.resolve(__dirname, '..', '..');
const ENTRY = path.join(root, 'dist', 'server', 'server', 'index.js');

export function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer();
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

/** One built server process (`node dist/server/server/index.js`), as a machine behind a load balancer runs it. */
export class ServerProcess {
  private child: ChildProcess | null = null;
  private out = '';
  base = '';

  /** Starts one process (BUNGWISE_WORKERS=1) on a free port over the test database; resolves once it has announced. */
  async start(extraEnv: NodeJS.ProcessEnv = {}): Promise<this> {
    if (!fs.existsSync(ENTRY)) throw new Error('dist/server is missing: run these tests through `npm test`, which builds the server.');
    const port = await freePort();
    const env: NodeJS.ProcessEnv = { ...process.env, PORT: String(port), BUNGWISE_WORKERS: '1', BUNGWISE_LOG_REQUESTS: '0', ...extraEnv };
    // No mail sender: the suites that test mail read the inbox and would see these processes' messages.
    delete env.SMTP_URL;
    this.base = `http://127.0.0.1:${port}`;
    const child = spawn('node', [ENTRY], { cwd: root, env, stdio: ['ignore', 'pipe', 'pipe'] });
    this.child = child;
    child.stdout!.on('data', (d) => (this.out += d));
    child.stderr!.on('data', (d) => (this.out += d));
    await new Promise<void>((resolve, reject) => {
      const timer = setInterval(() => {
        if (this.out.includes('Bungwise is running at')) {
          clearInterval(timer);
          child.removeListener('exit', exited);
          resolve();
        }
      }, 100);
      const exited = (code: number | null) => {
        clearInterval(timer);
        reject(new Error(`the server process exited with ${code}:\n${this.out}`));
      };
      child.once('exit', exited);
    });
    return this;
  }

  output(): string {
    return this.out;
  }

  /** SIGTERM, as a stop or a deploy sends it; resolves with the exit code. */
  stop(): Promise<number | null> {
    const child = this.child;
    this.child = null;
    if (!child || child.exitCode !== null) return Promise.resolve(child?.exitCode ?? null);
    return new Promise((resolve) => {
      child.once('exit', (code) => resolve(code));
      child.kill('SIGTERM');
    });
  }
}
