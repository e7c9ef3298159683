/**
 * A project-local PostgreSQL cluster on loopback, from Debian's binaries.
 * Used by `npm start`, `npm test` and the test global setup.
 */
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { accessSync, chmodSync, constants, existsSync, mkdirSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import pg from 'pg';

export interface LocalPostgres {
  port: number;
  dataDir: string;
  /** True when this process started the server (and so must stop it). */
  startedHere: boolean;
  stop(): void;
}

const isRoot = process.getuid?.() === 0;

function findBinDir(): string | undefined {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return undefined;
  const versions = readdirSync(base).filter((v) => existsSync(join(base, v, 'bin', 'pg_ctl')));
  versions.sort((a, b) => Number(b) - Number(a));
  return versions[0] ? join(base, versions[0], 'bin') : undefined;
}

/** Finds Debian's PostgreSQL, installing the package when we are root and it is missing. */
export function ensurePostgresBinaries(log: (s: string) => void): string {
  let bin = findBinDir();
  if (bin) return bin;
  if (!isRoot) {
    throw new Error('PostgreSQL is not installed. Run as root: apt-get update && apt-get install -y postgresql');
  }
  log('Installing PostgreSQL (Debian package postgresql)…');
  execFileSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
  execFileSync('apt-get', ['install', '-y', '-qq', 'postgresql'], { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  bin = findBinDir();
  if (!bin) throw new Error('PostgreSQL installed but its binaries were not found under /usr/lib/postgresql');
  return bin;
}

/** Whether the postgres user can reach `dir`: every folder above it needs o+x. */
function reachableByOthers(dir: string): boolean {
  for (let d = resolve(dir); d !== '/'; d = dirname(d)) {
    if (!existsSync(d)) continue;
    try {
      const out = execFileSync('stat', ['-c', '%a', d]).toString().trim();
      if ((Number.parseInt(out.slice(-1), 8) & 1) === 0) return false;
    } catch {
      return false;
    }
  }
  return true;
}

/**
 * Where the cluster lives: `<project>/.data/<name>` when the postgres user can reach it,
 * otherwise under the system's temporary folder, named after a hash of the project path.
 */
export function clusterDir(projectRoot: string, name: string): string {
  const local = join(projectRoot, '.data', name);
  if (!isRoot || reachableByOthers(join(projectRoot, '.data'))) return local;
  const hash = createHash('sha256').update(resolve(projectRoot)).digest('hex').slice(0, 12);
  return join(tmpdir(), `ebbroot-${hash}`, name);
}

async function answers(port: number): Promise<boolean> {
  const client = new pg.Client({ host: '127.0.0.1', port, user: 'postgres', database: 'postgres', connectionTimeoutMillis: 1500 });
  try {
    await client.connect();
    await client.end();
    return true;
  } catch {
    return false;
  }
}

function runAsOwner(cmd: string, args: string[]): void {
  const res = isRoot
    ? spawnSync('runuser', ['-u', 'postgres', '--', cmd, ...args], { encoding: 'utf8' })
    : spawnSync(cmd, args, { encoding: 'utf8' });
  if (res.status !== 0) throw new Error(`${cmd} failed:\n${res.stdout}\n${res.stderr}`);
}

function makeOwnedDir(dir: string): void {
  mkdirSync(dir, { recursive: true });
  if (isRoot) {
    execFileSync('chown', ['postgres:postgres', dir]);
    chmodSync(dir, 0o700);
  }
}

export interface StartOptions {
  projectRoot: string;
  name: string;
  port: number;
  /** Tests only: trade durability for speed. */
  fast?: boolean;
  log: (s: string) => void;
}

/** Starts the cluster (creating it on first use) or reuses a server already answering on the port. */
export async function startLocalPostgres(opts: StartOptions): Promise<LocalPostgres> {
  const dataDir = clusterDir(opts.projectRoot, opts.name);
  const noop = { port: opts.port, dataDir, startedHere: false, stop: () => undefined };
  if (await answers(opts.port)) return noop;
  const bin = ensurePostgresBinaries(opts.log);
  const socketDir = join(dirname(dataDir), `${opts.name}-socket`);
  const logFile = join(dirname(dataDir), `${opts.name}.log`);
  mkdirSync(dirname(dataDir), { recursive: true });
  makeOwnedDir(socketDir);
  if (!existsSync(join(dataDir, 'PG_VERSION'))) {
    makeOwnedDir(dataDir);
    runAsOwner(join(bin, 'initdb'), ['-D', dataDir, '-U', 'postgres', '--auth=trust', '-E', 'UTF8', '--locale=C.UTF-8']);
  }
  if (isRoot && !existsSync(logFile)) {
    execFileSync('touch', [logFile]);
    execFileSync('chown', ['postgres:postgres', logFile]);
  }
  const fast = opts.fast ? ' -c fsync=off -c synchronous_commit=off -c full_page_writes=off' : '';
  const serverOpts = `-c listen_addresses=127.0.0.1 -p ${opts.port} -k ${socketDir}${fast}`;
  runAsOwner(join(bin, 'pg_ctl'), ['-D', dataDir, '-l', logFile, '-w', '-t', '60', '-o', serverOpts, 'start']);
  accessSync(dataDir, constants.F_OK);
  return {
    port: opts.port,
    dataDir,
    startedHere: true,
    stop: () => {
      try {
        runAsOwner(join(bin, 'pg_ctl'), ['-D', dataDir, '-m', 'fast', '-w', 'stop']);
      } catch (err) {
        opts.log(`Stopping PostgreSQL failed: ${String(err)}`);
      }
    },
  };
}

/** Creates the database when missing; `fresh` drops it first. */
export async function ensureDatabase(port: number, name: string, fresh = false): Promise<void> {
  if (!/^[a-z_][a-z0-9_]*$/.test(name)) throw new Error(`Unsafe database name: ${name}`);
  const client = new pg.Client({ host: '127.0.0.1', port, user: 'postgres', database: 'postgres' });
  await client.connect();
  try {
    if (fresh) await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    const found = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    if (found.rowCount === 0) await client.query(`CREATE DATABASE ${name}`);
  } finally {
    await client.end();
  }
}

export async function dropDatabase(port: number, name: string): Promise<void> {
  const client = new pg.Client({ host: '127.0.0.1', port, user: 'postgres', database: 'postgres' });
  await client.connect();
  try {
    await client.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
  } finally {
    await client.end();
  }
}
