import cluster, { type Worker } from 'node:cluster';
import { announce, EXIT_CANNOT_LISTEN } from './announce';

/** Restarts allowed within CRASH_WINDOW_MS before the primary gives up and exits non-zero. */
const MAX_RESTARTS = 5;
const CRASH_WINDOW_MS = 60_000;

/**
 * Starts the workers, announces once every one of them answers, starts a worker again if one dies later
 * (waiting longer after each crash, and giving up on a crash loop), and on Ctrl-C or SIGTERM lets every
 * worker finish its requests before exiting. A worker that dies before it ever answered (bad
 * configuration, port taken) stops the whole server with a non-zero exit code.
 */
export function runPrimary(workers: number): void {
  const port = Number(process.env.PORT ?? 8080);
  // Each worker's database pools get a share, so the total stays near what one process used to open.
  const poolShare = process.env.BUNGWISE_DB_POOL ?? String(Math.max(2, Math.ceil(20 / workers)));
  let stopping = false;
  let announced = false;
  let readyCount = 0;
  const ready = new WeakSet<Worker>();
  const restarts: number[] = [];

  const start = (): void => {
    const worker = cluster.fork({ BUNGWISE_DB_POOL: poolShare });
    worker.on('message', (msg: { bungwise?: string }) => {
      if (msg?.bungwise !== 'ready' || ready.has(worker)) return;
      ready.add(worker);
      readyCount++;
      if (!announced && readyCount >= workers) {
        announced = true;
        announce(port, workers);
      }
    });
  };

  const stopWorkers = () => {
    stopping = true;
    for (const w of Object.values(cluster.workers ?? {})) w?.process.kill('SIGTERM');
  };
  const giveUp = (code: number) => {
    stopWorkers();
    process.exit(code);
  };

  cluster.on('exit', (worker, code, signal) => {
    if (stopping) {
      if (!Object.keys(cluster.workers ?? {}).length) process.exit(0);
      return;
    }
    if (code === EXIT_CANNOT_LISTEN || !ready.has(worker)) {
      if (code !== EXIT_CANNOT_LISTEN) console.error(`[bungwise] a server process failed while starting (${signal ?? `exit code ${code}`}); stopping`);
      giveUp(1);
      return;
    }
    const now = Date.now();
    while (restarts.length && now - restarts[0] > CRASH_WINDOW_MS) restarts.shift();
    if (restarts.length >= MAX_RESTARTS) {
      console.error(`[bungwise] server processes stopped ${restarts.length + 1} times within a minute; stopping`);
      giveUp(1);
      return;
    }
    restarts.push(now);
    const delay = 500 * 2 ** (restarts.length - 1);
    console.error(`[bungwise] server process ${worker.process.pid} stopped (${signal ?? `exit code ${code}`}); starting another in ${delay} ms`);
    // Not unref'd: with every worker gone, this timer is what keeps the primary alive to restart one.
    setTimeout(() => {
      if (!stopping) start();
    }, delay);
  });

  const stop = () => {
    if (stopping) return;
    stopWorkers();
    if (!Object.keys(cluster.workers ?? {}).length) process.exit(0);
    setTimeout(() => process.exit(0), 8000).unref();
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);

  for (let i = 0; i < workers; i++) start();
}
