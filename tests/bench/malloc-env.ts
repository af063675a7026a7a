/**
 * glibc's malloc settings for a benchmarked server, as `npm start` sets them (package.json; DEVELOPERS.md, decision 38):
 * two arenas, and blocks of 128 KiB and more (image buffers) mapped on their own, so freeing one gives it back to the
 * system instead of leaving a hole in an arena. Each can be overridden from the environment; an empty value leaves
 * glibc's default (`MALLOC_MMAP_THRESHOLD_= npx tsx tests/bench/load.ts`, say, to compare).
 */
const NPM_START = { MALLOC_ARENA_MAX: '2', MALLOC_MMAP_THRESHOLD_: '131072' };

/** The environment for the server's process, and the settings in words for the figures. */
export function mallocEnv(env: NodeJS.ProcessEnv = process.env) {
  const inherited: NodeJS.ProcessEnv = { ...env };
  const chosen: Record<string, string> = {};
  for (const [name, value] of Object.entries(NPM_START)) {
    const wanted = env[name] ?? value;
    delete inherited[name];
    if (wanted) chosen[name] = wanted;
  }
  const words =
    Object.keys(NPM_START)
      .map((name) => `${name}=${chosen[name] ?? "glibc's default"}`)
      .join(', ') + (Object.keys(chosen).length === Object.keys(NPM_START).length ? ', as npm start' : '');
  return { env: { ...inherited, ...chosen }, words };
}
