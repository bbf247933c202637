import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { repoRoot } from './processes';

const inputs = ['src', 'server/schemas', 'index.html', 'vite.config.ts', 'package-lock.json'];

function newestMtime(target: string): number {
  if (!fs.existsSync(target)) return 0;
  const stat = fs.statSync(target);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return fs.readdirSync(target).reduce((newest, name) => Math.max(newest, newestMtime(path.join(target, name))), stat.mtimeMs);
}

/** Builds the client into dist/client when it is missing or older than any of its sources. */
export function buildClientIfStale(say: (line: string) => void): void {
  const built = path.join(repoRoot, 'dist/client/index.html');
  const builtAt = fs.existsSync(built) ? fs.statSync(built).mtimeMs : 0;
  const sourcesAt = Math.max(...inputs.map((p) => newestMtime(path.join(repoRoot, p))));
  if (builtAt >= sourcesAt) return;
  say('Building the client…');
  const result = spawnSync(process.execPath, ['node_modules/vite/bin/vite.js', 'build', '--logLevel', 'warn'], { cwd: repoRoot, stdio: 'inherit' });
  if (result.status !== 0) throw new Error('The client build failed (see above)');
}
