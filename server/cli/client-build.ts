/** Whether dist/client is older than the client sources, so `npm start` rebuilds only when needed. */
import { existsSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { projectRoot } from './stack.js';

const stampFile = join(projectRoot, 'dist', 'client', '.built-at');
const sources = ['src', 'shared', 'index.html', 'vite.config.ts', 'package-lock.json'];

function newestMtime(path: string): number {
  if (!existsSync(path)) return 0;
  const st = statSync(path);
  if (!st.isDirectory()) return st.mtimeMs;
  return readdirSync(path).reduce((max, name) => Math.max(max, newestMtime(join(path, name))), st.mtimeMs);
}

export function clientBuildIsStale(): boolean {
  if (!existsSync(stampFile)) return true;
  const built = statSync(stampFile).mtimeMs;
  return sources.some((s) => newestMtime(join(projectRoot, s)) > built);
}

export function markClientBuilt(): void {
  writeFileSync(stampFile, new Date().toISOString());
}
