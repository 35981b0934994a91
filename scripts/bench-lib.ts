// The benchmark's shared pieces: the figures table, load generation and the server under test.
import { spawn, type ChildProcess } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
// eslint-disable-next-line @typescript-eslint/no-require-imports
const autocannon = require('autocannon');

export const root = path.resolve(__dirname, '..', '..', '..');
export const SIZES = { suppliers: 200, drumTypes: 10_000, tubes: 30_000, connectors: 30_000, pairings: 100_000, importRows: 100_000, stations: 200 };

/**
 * The parts to run: `BUNGWISE_BENCH_ONLY=fit,list,import,sourcing,web` (any of them, comma-separated) runs
 * only those; unset runs all. The registry is always loaded.
 */
export const PARTS = ['fit', 'list', 'import', 'sourcing', 'web'] as const;
export type Part = (typeof PARTS)[number];
const only = (process.env.BUNGWISE_BENCH_ONLY ?? '')
  .split(',')
  .map((s) => s.trim())
  .filter(Boolean);
for (const p of only) if (!(PARTS as readonly string[]).includes(p)) throw new Error(`BUNGWISE_BENCH_ONLY: "${p}" is not one of ${PARTS.join(', ')}`);
export const wants = (part: Part) => only.length === 0 || only.includes(part);

export interface Row {
  figure: string;
  value: number;
  unit: string;
  floor: number;
  floorLabel: string;
  ratio: number;
  target: string;
  met: boolean;
}
export const rows: Row[] = [];
// Progress goes to stderr: standard output carries the table and, as its last line, the JSON object.
export const log = (s: string) => console.error(`[bench] ${s}`);

export function add(figure: string, value: number, unit: string, floor: number, floorLabel: string, target: string, met: boolean, ratio = value / floor): void {
  rows.push({ figure, value: Math.round(value * 100) / 100, unit, floor: Math.round(floor * 100) / 100, floorLabel, ratio: Math.round(ratio * 1000) / 1000, target, met });
}

export function percentile(sorted: number[], p: number): number {
  if (!sorted.length) return NaN;
  return sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))];
}

export async function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const s = net.createServer();
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as net.AddressInfo;
      s.close(() => resolve(port));
    });
  });
}

export let serverProcesses = 1;

/** Starts the server as `npm start` does (one process per core) and waits until it says every process answers. */
export async function startServer(port: number): Promise<ChildProcess> {
  const child = spawn('node', [path.join(root, 'dist', 'server', 'server', 'index.js')], {
    cwd: root,
    env: { ...process.env, PORT: String(port), BUNGWISE_LOG_REQUESTS: '0', BUNGWISE_DEMO: '0', S3_BUCKET: '', SMTP_URL: '', BUNGWISE_IMPORT_TIMING: '1' },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  return new Promise((resolve, reject) => {
    let out = '';
    const timer = setTimeout(() => reject(new Error('the server did not start within 30 s')), 30_000);
    child.stdout!.on('data', (d: Buffer) => {
      out += d;
      const running = out.match(/Bungwise is running at \S+( \((\d+) server processes\))?/);
      if (running) {
        clearTimeout(timer);
        serverProcesses = Number(running[2] ?? 1);
        log(`server: ${serverProcesses} process(es)`);
        resolve(child);
      }
    });
    child.on('exit', (code) => reject(new Error(`the server exited with ${code}`)));
  });
}

export interface CannonResult {
  requests: { average: number; total: number };
  latency: { p50: number; p99: number };
  non2xx: number;
  errors: number;
}

export function cannon(opts: Record<string, unknown>): Promise<CannonResult> {
  return new Promise((resolve, reject) => autocannon({ connections: 20, duration: 10, ...opts }, (err: Error | null, res: never) => (err ? reject(err) : resolve(res))));
}

/** The session the API hands out, for requests made by the benchmark. */
export async function signIn(base: string, email: string): Promise<{ token: string }> {
  const res = await fetch(`${base}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ email, password: 'bench-password-1' }),
  });
  return (await res.json()) as { token: string };
}
