// What every part of the launcher (scripts/launch.mjs) uses: the checkout's root, the environment, running a
// command, stopping with a sentence, hashing sources, finding ports. Node built-ins only.
import { spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

export const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
export const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
export const env = { ...process.env };

/** A start-up failure the user can fix: one sentence, no stack trace. */
export class Stop extends Error {}
export function fail(sentence) {
  throw new Stop(sentence);
}

// The launcher's own messages go to stderr: stdout is left to what it runs, so that the last line of
// `npm run bench` is the benchmark's JSON even though the cluster is stopped after it.
export function log(message) {
  console.error(`[bungwise] ${message}`);
}

export function run(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { stdio: 'inherit', cwd: root, env, ...options });
  if (result.error) fail(`Could not run ${cmd}: ${result.error.message}.`);
  return result.status ?? 1;
}

export function runQuiet(cmd, args, options = {}) {
  return spawnSync(cmd, args, { encoding: 'utf8', cwd: root, env, ...options });
}

/** The sha256 of the files below each entry (paths relative to the root), skipping node_modules and dot files. */
export function hashFiles(entries) {
  const hash = createHash('sha256');
  const walk = (p) => {
    if (!fs.existsSync(p)) return;
    const stat = fs.statSync(p);
    if (stat.isDirectory()) {
      for (const name of fs.readdirSync(p).sort()) {
        if (name === 'node_modules' || name.startsWith('.')) continue;
        walk(path.join(p, name));
      }
    } else {
      hash.update(path.relative(root, p));
      hash.update(fs.readFileSync(p));
    }
  };
  for (const entry of entries) walk(path.join(root, entry));
  return hash.digest('hex');
}

export function portFree(port) {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve(false));
    server.listen(port, '127.0.0.1', () => server.close(() => resolve(true)));
  });
}

export function freePort() {
  return new Promise((resolve) => {
    const s = net.createServer();
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });
}
