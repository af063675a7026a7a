/**
 * `npm test`: typecheck, lint, the Prettier check, then unit, API and end-to-end tests against real services
 * (a throwaway PostgreSQL cluster, s3rver, the SMTP capture, Debian's Chromium).
 * `npm run test:e2e` runs only the browser journeys.
 */
import { spawnSync } from 'node:child_process';
import { ensureChromium } from './support/chromium';
import { startTestCluster } from './support/test-cluster';

// `tsx tests/run.ts [unit|api|e2e] [vitest filters…]` runs one level (and files matching the filters).
const only = process.argv[2];
const filters = process.argv.slice(3);
const step = (name: string, cmd: string, args: string[], env: NodeJS.ProcessEnv = {}) => {
  const started = Date.now();
  console.log(`\n▶ ${name}`);
  const result = spawnSync(cmd, args, { stdio: 'inherit', env: { ...process.env, ...env } });
  console.log(`  ${name}: ${result.status === 0 ? 'ok' : 'FAILED'} in ${((Date.now() - started) / 1000).toFixed(1)} s`);
  return result.status === 0;
};

process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED = 'true';
let ok = true;
if (!only) {
  ok = step('typecheck', 'npx', ['tsc', '-b']) && ok;
  ok = step('lint', 'npx', ['eslint', '.', '--max-warnings=0']) && ok;
  ok = step('format', 'npx', ['prettier', '--check', '.', '--log-level=warn']) && ok;
}
if (!only || only === 'e2e') ensureChromium();
const cluster = await startTestCluster();
const stop = () => cluster.stop();
process.once('SIGINT', () => (stop(), process.exit(130)));
try {
  const projects = only ? ['--project', only] : ['--project', 'unit', '--project', 'api', '--project', 'e2e'];
  ok =
    step('vitest', 'npx', ['vitest', 'run', ...projects, ...filters], {
      GRIDLEAK_TEST_TEMPLATE_URL: cluster.templateUrl,
    }) && ok;
} finally {
  stop();
}
console.log(ok ? '\nAll checks passed.' : '\nSome checks failed.');
process.exit(ok ? 0 : 1);
