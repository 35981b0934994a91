import { ClusterMemoryStorePrimary } from '@express-rate-limit/cluster-memory-store';
import cluster, { type Worker } from 'node:cluster';
import { announce, EXIT_CANNOT_LISTEN } from './announce';

/**
 * Starts the workers, announces once they all answer, starts a worker again if one dies, and on
 * Ctrl-C or SIGTERM lets every worker finish its requests before exiting.
 */
export async function runPrimary(workers: number): Promise<void> {
  const port = Number(process.env.PORT ?? 8080);
  // The sign-in limits count failures across all workers, here.
  await new ClusterMemoryStorePrimary().init();
  let stopping = false;
  let announced = false;
  const ready = new Set<number>();

  const start = (): Worker => {
    const worker = cluster.fork();
    worker.on('message', (msg: { bungwise?: string }) => {
      // Announce once every first worker has its database connection, so no early request meets one that has not.
      if (msg?.bungwise !== 'ready' || announced) return;
      ready.add(worker.id);
      if (ready.size >= workers) {
        announced = true;
        announce(port, workers);
      }
    });
    return worker;
  };

  cluster.on('exit', (worker, code, signal) => {
    if (stopping) {
      if (!Object.keys(cluster.workers ?? {}).length) process.exit(0);
      return;
    }
    if (code === EXIT_CANNOT_LISTEN) {
      stopping = true;
      for (const w of Object.values(cluster.workers ?? {})) w?.kill('SIGTERM');
      process.exit(1);
    }
    console.error(`[bungwise] server process ${worker.process.pid} stopped (${signal ?? `exit code ${code}`}); starting another`);
    setTimeout(start, 500).unref();
  });

  const stop = () => {
    if (stopping) return;
    stopping = true;
    for (const w of Object.values(cluster.workers ?? {})) w?.process.kill('SIGTERM');
    setTimeout(() => process.exit(0), 8000).unref();
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);

  for (let i = 0; i < workers; i++) start();
}
