import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';

const INPUTS = [
  'src',
  'shared',
  'index.html',
  'vite.config.ts',
  'package-lock.json',
  'server/client-serving/precompress.ts',
];

function newestMtime(p: string): number {
  if (!existsSync(p)) return 0;
  const stat = statSync(p);
  if (!stat.isDirectory()) return stat.mtimeMs;
  return readdirSync(p).reduce((max, name) => Math.max(max, newestMtime(path.join(p, name))), stat.mtimeMs);
}

/** Builds the client with Vite when dist/ is missing or older than any of its inputs. */
export async function buildClientIfStale(root: string): Promise<string> {
  const dist = path.join(root, 'dist');
  const builtAt = newestMtime(path.join(dist, 'index.html'));
  const changedAt = Math.max(...INPUTS.map((i) => newestMtime(path.join(root, i))));
  if (builtAt > changedAt) return dist;
  console.log(builtAt ? 'The client changed since the last build; building…' : 'Building the client…');
  const { build } = await import('vite');
  await build({ root, logLevel: 'warn' });
  return dist;
}
