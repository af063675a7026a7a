import { randomUUID } from 'node:crypto';
import { mkdirSync, readdirSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';

/**
 * Uploads are streamed to files in one folder of their own, named after the process that receives them
 * (`<pid>-<uuid>`). A file whose process is gone was left by a crash; start-up removes those, and a
 * process removes its own on the way out, even when it stops on an uncaught error.
 */
export const uploadTempDir = (base = os.tmpdir()) => path.join(base, 'gridleak-uploads');

const live = new Set<string>();
let exitHook = false;

/** A fresh temporary path for one upload; `release()` it when the upload is done with. */
export function uploadTempPath(base?: string): { path: string; release(): void } {
  const dir = uploadTempDir(base);
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  const file = path.join(dir, `${process.pid}-${randomUUID()}`);
  live.add(file);
  if (!exitHook) {
    exitHook = true;
    // 'exit' runs on process.exit() and after an uncaught exception; only synchronous work is possible there.
    process.once('exit', () => {
      for (const f of live) rmSync(f, { force: true });
    });
  }
  return { path: file, release: () => void live.delete(file) };
}

const alive = (pid: number) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
};

/**
 * Removes upload files left behind by processes that no longer run, and any older than `maxAgeMs`
 * (a pid can be reused). Returns how many were removed.
 */
export function sweepUploadTemp(base?: string, maxAgeMs = 24 * 60 * 60 * 1000): number {
  const dir = uploadTempDir(base);
  let names: string[];
  try {
    names = readdirSync(dir);
  } catch {
    return 0;
  }
  let removed = 0;
  for (const name of names) {
    const file = path.join(dir, name);
    const pid = Number(name.split('-')[0]);
    const stale = !Number.isInteger(pid) || pid <= 0 || (pid !== process.pid && !alive(pid));
    let old: boolean;
    try {
      old = Date.now() - statSync(file).mtimeMs > maxAgeMs;
    } catch {
      continue;
    }
    if (stale || old) {
      rmSync(file, { force: true, recursive: true });
      removed++;
    }
  }
  return removed;
}
