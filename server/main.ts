import http from 'node:http';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { pino } from 'pino';
import { createApp, type AppDeps } from './app';
import { scheduleNotificationMail } from './features/notifications/schedule-mail';
import { buildClientIfStale } from './client-serving/build-if-stale';
import { serveBuiltClient, serveViteDev } from './client-serving/serve-client';
import { connectDatabase } from './db/client';
import { applyMigrations } from './db/migrate';
import { demoPeople, DEMO_PASSWORD } from './db/seed/demo-scenario';
import { seedDemo } from './db/seed/seed-demo';
import { seedDemoBringup } from './db/seed/seed-demo-bringup';
import { seedDemoFindings } from './features/demo/seed-demo-findings';
import { seedDemoPhotos } from './features/demo/seed-demo-photos';
import { seedDemoSheet } from './features/demo/seed-demo-sheet';
import { seedDemoSafety } from './features/demo/seed-demo-safety';
import { seedDemoHelp } from './features/demo/seed-demo-help';
import { seedDemoMoney } from './features/demo/seed-demo-money';
import { seedDemoWorkshop } from './features/demo/seed-demo-workshop';
import { backfillPhoneVariants } from './features/photos/backfill-phone-variants';
import { scheduleSweep } from './features/photos/schedule-sweep';
import { sweepUploadTemp } from './features/photos/upload-temp';
import {
  EnvError,
  isDemo,
  listenHost,
  parseEnv,
  publicOrigin,
  sessionSecret,
  startupWarnings,
  uploadLimits,
} from './env';
import { defaultThrottle } from './features/auth/throttle';
import { LocalServiceError } from './local-services/run-command';
import { redactedError } from './http/redact-error';
import { createMailer } from './mail';
import { resolveDatabase, resolveMail, resolvePayments, resolveStorage, type Stop } from './start/services';
import { createPaymentService } from './features/payments/payment-service';
import { createStorage } from './storage';

process.env.AWS_SDK_JS_NODE_VERSION_SUPPORT_WARNING_DISABLED ??= 'true';
const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const dev = process.argv.includes('--dev');
const stops: Stop[] = [];

async function main() {
  const env = parseEnv();
  const logger = pino({ level: env.LOG_LEVEL, serializers: { err: redactedError } });
  for (const warning of startupWarnings(env)) logger.warn(warning);
  const onSignal = () => void shutdown(0);
  process.once('SIGINT', onSignal);
  process.once('SIGTERM', onSignal);

  const databaseUrl = await resolveDatabase(env, root, stops);
  await applyMigrations(databaseUrl);
  const handle = connectDatabase(databaseUrl);
  stops.push({ name: 'database pool', stop: () => handle.pool.end() });
  const demo = isDemo(env);
  const storage = createStorage(await resolveStorage(env, root, stops));
  const mailer = createMailer(await resolveMail(env, handle, stops), env.MAIL_FROM);
  const uploads = uploadLimits(env);
  const payments = createPaymentService(await resolvePayments(env, stops));
  if (demo) {
    await seedDemo(handle.db);
    await seedDemoPhotos({ db: handle.db, storage, config: { uploads } });
    await seedDemoFindings(handle.db);
    await seedDemoSheet({ db: handle.db, storage, config: { uploads } });
    await seedDemoWorkshop(handle.db);
    await seedDemoMoney(handle.db);
    await seedDemoSafety(handle.db);
    await seedDemoBringup(handle.db);
    await seedDemoHelp(handle.db);
  }
  await backfillPhoneVariants(handle.db, storage, logger);
  scheduleSweep(handle.db, storage, logger);
  const leftovers = sweepUploadTemp();
  if (leftovers > 0) logger.info(`removed ${leftovers} temporary upload files left by a stopped instance`);

  const server = http.createServer();
  const origin = publicOrigin(env, env.PORT);
  const deps: AppDeps = {
    db: handle.db,
    pool: handle.pool,
    storage,
    mailer,
    logger,
    payments,
    config: {
      publicOrigin: origin,
      sessionSecret: sessionSecret(env),
      demo,
      devMail: env.NODE_ENV !== 'production',
      throttle: defaultThrottle,
      uploads,
      notificationWindowSeconds: env.NOTIFICATION_WINDOW_SECONDS,
    },
  };
  const app = createApp(deps, { trustProxy: env.TRUST_PROXY, relaxedCsp: dev });
  scheduleNotificationMail(deps);
  if (dev) stops.unshift({ name: 'Vite', stop: await serveViteDev(app, server, root) });
  else serveBuiltClient(app, await buildClientIfStale(root));
  server.on('request', app);
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(env.PORT, listenHost(env), resolve);
  });
  stops.unshift({ name: 'web server', stop: () => new Promise((r) => server.close(() => r())) });
  server.closeIdleConnections?.();
  printWelcome(origin, demo);
}

function printWelcome(origin: string, demo: boolean) {
  console.log(`\nGridleak is running at ${origin}${dev ? ' (development, hot reload)' : ''}`);
  if (demo) {
    console.log(`Demo accounts (password "${DEMO_PASSWORD}"):`);
    for (const [role, p] of Object.entries(demoPeople))
      console.log(`  ${role.padEnd(10)} ${p.name.padEnd(18)} ${p.email}`);
  }
  console.log('Press Ctrl-C to stop everything.\n');
}

let stopping = false;
async function shutdown(code: number) {
  if (stopping) return;
  stopping = true;
  for (const { name, stop } of stops) {
    try {
      await stop();
    } catch (err) {
      console.error(`Stopping ${name}: ${(err as Error).message}`);
    }
  }
  process.exit(code);
}

main().catch(async (err: unknown) => {
  if (err instanceof EnvError) {
    console.error('Gridleak cannot start; fix these settings:');
    for (const line of err.problems) console.error(`  ${line}`);
  } else if (err instanceof LocalServiceError) console.error(`Gridleak cannot start: ${err.message}`);
  else if ((err as NodeJS.ErrnoException).code === 'EADDRINUSE')
    console.error(
      `Gridleak cannot start: port ${(err as { port?: number }).port ?? ''} is already in use (set PORT to another).`,
    );
  else console.error('Gridleak cannot start:', err);
  await shutdown(1);
});
