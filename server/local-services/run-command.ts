import { spawnSync, type SpawnSyncOptions } from 'node:child_process';

export class LocalServiceError extends Error {}

/** Runs a command to completion; throws a one-line error with its last output line on failure. */
export function run(command: string, args: string[], options: SpawnSyncOptions = {}): string {
  const result = spawnSync(command, args, { encoding: 'utf8', cwd: '/', ...options });
  if (result.error) throw new LocalServiceError(`${command} could not run: ${result.error.message}`);
  if (result.status !== 0) {
    const out = `${result.stderr ?? ''}\n${result.stdout ?? ''}`.trim().split('\n').filter(Boolean);
    throw new LocalServiceError(`${command} ${args[0] ?? ''} failed: ${out.at(-1) ?? `exit ${result.status}`}`);
  }
  return String(result.stdout ?? '');
}

export const isRoot = () => process.getuid?.() === 0;

/** Installs Debian packages when running as root, else stops with the command to run. */
export function ensureDebianPackage(pkg: string, present: () => boolean, why: string): void {
  if (present()) return;
  if (!isRoot())
    throw new LocalServiceError(
      `${why} needs the Debian package ${pkg}: run "sudo apt-get install -y ${pkg}" and try again.`,
    );
  console.log(`Installing ${pkg} (${why})…`);
  run('apt-get', ['update'], { stdio: 'ignore' });
  run('apt-get', ['install', '-y', '--no-install-recommends', pkg], {
    env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' },
    stdio: 'ignore',
  });
  if (!present()) throw new LocalServiceError(`${pkg} was installed but is still not usable.`);
}
