// Runs a PostgreSQL cluster of the project's own from Debian's packages, on loopback, with its socket
// inside the data folder. Used by `npm start` (data kept in .data/, fsync on) and by the tests
// (a throw-away folder, fsync off). initdb and pg_ctl refuse to run as root, so as root they run as
// the `postgres` system user.
import { execFileSync, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';

const isRoot = process.getuid?.() === 0;

export function findPostgresBin(): string | null {
  const base = '/usr/lib/postgresql';
  if (!fs.existsSync(base)) return null;
  const majors = fs
    .readdirSync(base)
    .filter((v) => fs.existsSync(path.join(base, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return majors[0] ? path.join(base, majors[0], 'bin') : null;
}

/** Finds the server binaries, installing Debian's postgresql when missing and we are root. */
export function ensurePostgres(log: (line: string) => void = console.log): string {
  const found = findPostgresBin();
  if (found) return found;
  if (!isRoot) {
    throw new Error(
      'PostgreSQL server binaries were not found in /usr/lib/postgresql.\n' +
        'Install them with:  sudo apt-get install -y postgresql   (or set DATABASE_URL to a server of your own)',
    );
  }
  log('PostgreSQL is not installed; installing Debian\'s postgresql package (about a minute)…');
  fs.mkdirSync('/etc/postgresql-common', { recursive: true });
  // No system-wide "main" cluster: Spurwood runs a cluster of its own.
  fs.writeFileSync('/etc/postgresql-common/createcluster.conf', 'create_main_cluster = false\n');
  run('apt-get', ['update', '-qq']);
  run('apt-get', ['install', '-y', '-qq', '--no-install-recommends', 'postgresql'], { DEBIAN_FRONTEND: 'noninteractive' });
  const bin = findPostgresBin();
  if (!bin) throw new Error('apt-get finished but no PostgreSQL server binaries appeared in /usr/lib/postgresql');
  return bin;
}

function run(command: string, args: string[], env: Record<string, string> = {}): string {
  const result = spawnSync(command, args, { env: { ...process.env, ...env }, encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`${command} ${args.join(' ')} failed:\n${result.stderr || result.stdout}`);
  return result.stdout;
}

// As root, run the server tools as `postgres`, creating that system user on a bare machine.
function asServerUser(bin: string, tool: string, args: string[]): string {
  if (!isRoot) return run(path.join(bin, tool), args);
  const exists = spawnSync('id', ['-u', 'postgres']).status === 0;
  if (!exists) run('useradd', ['--system', '--home-dir', '/var/lib/postgresql', '--shell', '/bin/bash', 'postgres']);
  return run('runuser', ['-u', 'postgres', '--', path.join(bin, tool), ...args]);
}

function handOver(dir: string): void {
  if (!isRoot) return;
  execFileSync('chown', ['-R', 'postgres:', dir]);
}

export interface ClusterOptions {
  dataDir: string;
  port: number;
  /** Database role that owns the project's databases. */
  user: string;
  /** Password for `user`; omitted means trust on loopback (tests only). */
  password?: string;
  /** Off only for throw-away test clusters. */
  durable: boolean;
  /** PostgreSQL's own cache, e.g. '1GB'; its default (128 MB) suits the demo and the tests. */
  sharedBuffers?: string;
}

export interface Cluster {
  bin: string;
  options: ClusterOptions;
  url(database: string): string;
  stop(): void;
}

export function isInitialised(dataDir: string): boolean {
  return fs.existsSync(path.join(dataDir, 'PG_VERSION'));
}

export function initCluster(bin: string, options: ClusterOptions): void {
  fs.mkdirSync(options.dataDir, { recursive: true, mode: 0o700 });
  handOver(options.dataDir);
  const args = ['-D', options.dataDir, '-U', options.user, '--encoding=UTF8', '--locale=C.UTF-8'];
  if (options.password) {
    const pwfile = path.join(path.dirname(options.dataDir), `.pw-${process.pid}`);
    fs.writeFileSync(pwfile, `${options.password}\n`, { mode: 0o600 });
    handOver(pwfile);
    try {
      asServerUser(bin, 'initdb', [...args, '--auth-host=scram-sha-256', '--auth-local=scram-sha-256', `--pwfile=${pwfile}`]);
    } finally {
      fs.rmSync(pwfile, { force: true });
    }
  } else {
    asServerUser(bin, 'initdb', [...args, '--auth=trust']);
  }
}

export function startCluster(bin: string, options: ClusterOptions): Cluster {
  const settings = [`-h 127.0.0.1`, `-p ${options.port}`, `-k ${options.dataDir}`, '-c max_connections=200'];
  if (!options.durable) settings.push('-c fsync=off', '-c synchronous_commit=off', '-c full_page_writes=off');
  if (options.sharedBuffers) settings.push(`-c shared_buffers=${options.sharedBuffers}`);
  asServerUser(bin, 'pg_ctl', ['-D', options.dataDir, '-l', path.join(options.dataDir, 'server.log'), '-w', '-t', '60', '-o', settings.join(' '), 'start']);
  const credentials = options.password ? `${options.user}:${encodeURIComponent(options.password)}` : options.user;
  return {
    bin,
    options,
    url: (database) => `postgres://${credentials}@127.0.0.1:${options.port}/${database}`,
    stop: () => stopCluster(bin, options.dataDir),
  };
}

export function stopCluster(bin: string, dataDir: string): void {
  if (!fs.existsSync(path.join(dataDir, 'postmaster.pid'))) return;
  asServerUser(bin, 'pg_ctl', ['-D', dataDir, '-m', 'fast', '-w', '-t', '60', 'stop']);
}

/** A folder every user can enter, so the server user can reach a data folder inside it. */
export function makeOpenFolder(dir: string): string {
  fs.mkdirSync(dir, { recursive: true });
  fs.chmodSync(dir, 0o755);
  return dir;
}

/** Can the server user reach `dir`? As root the answer depends on every folder above it. */
export function serverUserCanEnter(dir: string): boolean {
  if (!isRoot) return true;
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir]).status === 0;
}
