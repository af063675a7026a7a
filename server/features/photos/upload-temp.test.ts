import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, rmSync, utimesSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { sweepUploadTemp, uploadTempDir, uploadTempPath } from './upload-temp';

const bases: string[] = [];
const base = () => {
  const dir = mkdtempSync(path.join(os.tmpdir(), 'gridleak-temp-test-'));
  bases.push(dir);
  return dir;
};
afterEach(() => {
  for (const dir of bases.splice(0)) rmSync(dir, { recursive: true, force: true });
});

/** The pid of a process that has already ended. */
const deadPid = () => spawnSync(process.execPath, ['-e', '0']).pid!;

describe('temporary upload files', () => {
  it('when a process that was receiving uploads is gone, then start-up removes its files and keeps live ones', () => {
    const dir = base();
    mkdirSync(uploadTempDir(dir), { recursive: true });
    const crashed = path.join(uploadTempDir(dir), `${deadPid()}-left-by-a-crash`);
    writeFileSync(crashed, 'partial upload');
    const mine = uploadTempPath(dir);
    writeFileSync(mine.path, 'upload in progress');
    expect(sweepUploadTemp(dir)).toBe(1);
    expect(existsSync(crashed)).toBe(false);
    expect(existsSync(mine.path)).toBe(true);
    mine.release();
  });

  it('when a file is older than a day, then it goes even if its pid is in use again', () => {
    const dir = base();
    const old = uploadTempPath(dir);
    writeFileSync(old.path, 'forgotten');
    const dayAgo = (Date.now() - 25 * 60 * 60 * 1000) / 1000;
    utimesSync(old.path, dayAgo, dayAgo);
    expect(sweepUploadTemp(dir)).toBe(1);
    expect(existsSync(old.path)).toBe(false);
    old.release();
  });

  it('when a process stops on an uncaught error, then its upload files are removed on the way out', () => {
    const dir = base();
    const script = `
      const { writeFileSync } = require('node:fs');
      const { uploadTempPath } = require(${JSON.stringify(path.resolve('server/features/photos/upload-temp.ts'))});
      const t = uploadTempPath(${JSON.stringify(dir)});
      writeFileSync(t.path, 'half an upload');
      console.log(t.path);
      throw new Error('crash while receiving');
    `;
    const run = spawnSync(process.execPath, ['--import', 'tsx', '-e', script], { encoding: 'utf8' });
    expect(run.status).not.toBe(0);
    const file = run.stdout.trim();
    expect(file.startsWith(uploadTempDir(dir))).toBe(true);
    expect(existsSync(file)).toBe(false);
  });
});
