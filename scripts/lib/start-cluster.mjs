// The launcher's private PostgreSQL cluster on loopback: created on first use (initdb, a generated password
// kept in the data folder), started and stopped with pg_ctl. Node built-ins only.
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { fallbackDataDir } from './cluster.mjs';
import { fail, isRoot, log, portFree, runQuiet } from './launcher.mjs';

// The cluster runs as the `postgres` user when we are root (PostgreSQL refuses root), so that user must be
// able to reach the data folder. A checkout under a private home folder is not reachable: fall back to a
// folder under the system's temporary directory, named after this checkout, and say so.
function asPostgres(cmd, args, options = {}) {
  if (!isRoot) return runQuiet(cmd, args, options);
  return runQuiet('runuser', ['-u', 'postgres', '--', cmd, ...args], options);
}

/** The data folder the cluster can live in: the configured one, or its fallback when running as root. */
function reachableDataDir(dataDir) {
  if (!isRoot) return dataDir;
  const probe = runQuiet('runuser', ['-u', 'postgres', '--', 'test', '-x', dataDir]);
  if (probe.status === 0) return dataDir;
  const fallback = fallbackDataDir(dataDir);
  log(`The postgres user cannot reach ${dataDir}; keeping the cluster in ${fallback} instead (set BUNGWISE_DATA_DIR to choose).`);
  fs.mkdirSync(fallback, { recursive: true });
  return fallback;
}

function clusterPaths(dataDir) {
  return {
    pgdata: path.join(dataDir, 'pg'),
    logFile: path.join(dataDir, 'pg', 'server.log'),
    secretFile: path.join(dataDir, 'db-password'),
  };
}

function createCluster(bin, dataDir, password) {
  const { pgdata } = clusterPaths(dataDir);
  log(`Creating a private PostgreSQL cluster in ${pgdata}...`);
  fs.mkdirSync(pgdata, { recursive: true, mode: 0o700 });
  const pwfile = path.join(dataDir, '.initdb-pw');
  fs.writeFileSync(pwfile, password, { mode: 0o600 });
  if (isRoot) {
    runQuiet('chown', ['-R', 'postgres:postgres', pgdata]);
    runQuiet('chown', ['postgres:postgres', pwfile]);
  }
  const init = asPostgres(path.join(bin, 'initdb'), ['-D', pgdata, '-U', 'bungwise', `--pwfile=${pwfile}`, '--auth-host=scram-sha-256', '--auth-local=scram-sha-256', '-E', 'UTF8', '--no-locale']);
  fs.rmSync(pwfile, { force: true });
  if (init.status !== 0) {
    fail(`Could not create the PostgreSQL cluster (${(init.stderr || init.stdout || '').trim().split('\n').pop()}): remove ${pgdata} and try again.`);
  }
  fs.appendFileSync(path.join(pgdata, 'postgresql.conf'), `\n# Bungwise private cluster\nlisten_addresses = '127.0.0.1'\nunix_socket_directories = '${pgdata}'\nfsync = on\n`);
}

/**
 * Starts the cluster in dataDir (or its fallback, see reachableDataDir) on pgPort, creating it first if need be.
 * Returns its password, whether this run started it, and the data folder actually used.
 */
export async function startCluster(bin, configuredDataDir, pgPort) {
  const dataDir = reachableDataDir(configuredDataDir);
  const { pgdata, logFile, secretFile } = clusterPaths(dataDir);
  if (!fs.existsSync(secretFile)) fs.writeFileSync(secretFile, randomBytes(18).toString('base64url'), { mode: 0o600 });
  const password = fs.readFileSync(secretFile, 'utf8').trim();
  if (!fs.existsSync(path.join(pgdata, 'PG_VERSION'))) createCluster(bin, dataDir, password);

  const status = asPostgres(path.join(bin, 'pg_ctl'), ['status', '-D', pgdata]);
  if (status.status === 0) {
    log('PostgreSQL cluster already running; using it.');
    return { password, startedHere: false, dataDir };
  }
  if (!(await portFree(pgPort))) {
    fail(`Port ${pgPort} is taken by another program: stop it or set BUNGWISE_PG_PORT to a free port.`);
  }
  const start = asPostgres(path.join(bin, 'pg_ctl'), ['start', '-w', '-t', '60', '-D', pgdata, '-l', logFile, '-o', `-p ${pgPort}`]);
  if (start.status !== 0) {
    const tail = fs.existsSync(logFile) ? fs.readFileSync(logFile, 'utf8').trim().split('\n').slice(-1)[0] : '';
    fail(`The PostgreSQL cluster would not start (${tail || 'no log'}): see ${logFile}.`);
  }
  return { password, startedHere: true, dataDir };
}

export function stopCluster(bin, dataDir) {
  const { pgdata } = clusterPaths(dataDir);
  asPostgres(path.join(bin, 'pg_ctl'), ['stop', '-m', 'fast', '-w', '-D', pgdata]);
}
