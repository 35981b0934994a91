// What a fresh machine may lack, installed by the launcher: the npm dependencies, PostgreSQL's server binaries
// and Chromium for the browser tests (Debian's packages, when run as root). Node built-ins only.
import fs from 'node:fs';
import path from 'node:path';
import { findPgBin } from './cluster.mjs';
import { env, fail, hashFiles, isRoot, log, root, run, runQuiet } from './launcher.mjs';

function canAptInstall() {
  return isRoot && runQuiet('sh', ['-c', 'command -v apt-get']).status === 0;
}

/** Installs one Debian package; true when apt-get succeeded. */
function aptInstall(pkg) {
  run('apt-get', ['update']);
  return run('apt-get', ['install', '-y', '--no-install-recommends', pkg], { env: { ...env, DEBIAN_FRONTEND: 'noninteractive' } }) === 0;
}

// 1. Dependencies: `npm ci` when node_modules is missing or the lock file changed since the last install.
export function ensureDependencies() {
  const stamp = path.join(root, 'node_modules', '.bungwise-lock-hash');
  const lockHash = hashFiles(['package-lock.json']);
  const current = fs.existsSync(stamp) ? fs.readFileSync(stamp, 'utf8') : '';
  if (current === lockHash) return;
  log('Installing dependencies (npm ci)...');
  if (run('npm', ['ci', '--no-audit', '--no-fund']) !== 0) {
    fail('Installing dependencies failed: check the npm output above, then run `npm start` again.');
  }
  fs.writeFileSync(stamp, lockHash);
}

export function checkDiskSpace(dataDir) {
  fs.mkdirSync(dataDir, { recursive: true });
  const stat = fs.statfsSync(dataDir);
  const freeMb = (stat.bavail * stat.bsize) / 1024 / 1024;
  if (freeMb < 300) {
    fail(`Only ${Math.round(freeMb)} MB free at ${dataDir}: free at least 300 MB or set BUNGWISE_DATA_DIR to a larger disk.`);
  }
}

// 2. PostgreSQL server binaries, from Debian's `postgresql` package (findPgBin in scripts/lib/cluster.mjs).
export function ensurePostgresBinaries() {
  let bin = findPgBin();
  if (bin) return bin;
  if (canAptInstall()) {
    log("PostgreSQL is not installed: installing Debian's postgresql package...");
    if (!aptInstall('postgresql')) {
      fail('Installing PostgreSQL failed: run `apt-get install -y postgresql` as root and try again.');
    }
    bin = findPgBin();
    if (bin) return bin;
  }
  fail('PostgreSQL server binaries are missing: run `sudo apt-get install -y postgresql` (or set DATABASE_URL to an existing server), then try again.');
}

export function ensureChromium() {
  if (env.BUNGWISE_CHROMIUM && fs.existsSync(env.BUNGWISE_CHROMIUM)) return;
  if (fs.existsSync('/usr/bin/chromium')) return;
  if (canAptInstall()) {
    log("Chromium is missing for the browser tests: installing Debian's chromium package...");
    if (aptInstall('chromium')) return;
  }
  fail('Chromium is missing for the browser tests: run `sudo apt-get install -y chromium`, then `npm test` again.');
}
