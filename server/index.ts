// The server's entry: one process per core (BUNGWISE_WORKERS overrides, 1 runs a single process), sharing
// the port through node:cluster. Each process is stateless apart from what it keeps in memory, which the
// change feed keeps true; the sign-in limits are counted in the database for all of them.
import cluster from 'node:cluster';
import os from 'node:os';

function workerCount(): number {
  const asked = Number(process.env.BUNGWISE_WORKERS);
  if (Number.isInteger(asked) && asked >= 1) return Math.min(asked, 32);
  return Math.max(1, Math.min(os.availableParallelism(), 8));
}

const workers = workerCount();
if (cluster.isPrimary && workers > 1) {
  void import('./primary').then(({ runPrimary }) => runPrimary(workers));
} else {
  void import('./serve');
}
