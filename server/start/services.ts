import path from 'node:path';
import { listenHost, type Env } from '../env';
import type { DatabaseHandle } from '../db/client';
import { startMailCapture } from '../local-services/mail-capture';
import { startLocalPostgres } from '../local-services/postgres';
import { startPaymentFake } from '../local-services/payments/payment-fake';
import { startS3StandIn } from '../local-services/s3-stand-in';
import type { PaymentServiceConfig } from '../features/payments/payment-service';
import type { StorageConfig } from '../storage';

/** Ports of the local stand-ins, each of its own; a second checkout can move them with GRIDLEAK_PORT_BASE. */
export function localPorts(env: Env) {
  const base = env.GRIDLEAK_PORT_BASE;
  // base + 3 is left free: the journeys put the app itself there.
  return { postgres: base, s3: base + 1, smtp: base + 2, payments: base + 4 };
}

export interface Stop {
  name: string;
  stop: () => void | Promise<void>;
}

/** Real services from the environment, or the local stand-ins when a variable is unset. */
export async function resolveDatabase(env: Env, root: string, stops: Stop[]): Promise<string> {
  if (env.DATABASE_URL) return env.DATABASE_URL;
  const pg = await startLocalPostgres({
    dataDir: path.join(dataRoot(env, root), 'pg'),
    port: localPorts(env).postgres,
    database: 'gridleak',
  });
  stops.push({ name: 'PostgreSQL', stop: pg.stop });
  return pg.url;
}

export async function resolveStorage(env: Env, root: string, stops: Stop[]): Promise<StorageConfig> {
  if (env.S3_ENDPOINT && env.S3_BUCKET && env.S3_ACCESS_KEY_ID && env.S3_SECRET_ACCESS_KEY)
    return {
      endpoint: env.S3_ENDPOINT,
      bucket: env.S3_BUCKET,
      region: env.S3_REGION,
      accessKeyId: env.S3_ACCESS_KEY_ID,
      secretAccessKey: env.S3_SECRET_ACCESS_KEY,
    };
  const dir = env.GRIDLEAK_DATA_DIR ? path.join(env.GRIDLEAK_DATA_DIR, 'objects') : path.join(root, 'uploads-dev');
  const s3 = await startS3StandIn(dir, localPorts(env).s3, env.S3_BUCKET ?? 'gridleak');
  stops.push({ name: 'local S3', stop: s3.close });
  return { ...s3, region: env.S3_REGION };
}

export async function resolveMail(env: Env, handle: DatabaseHandle, stops: Stop[]): Promise<string> {
  if (env.SMTP_URL) return env.SMTP_URL;
  const capture = await startMailCapture(handle.db, localPorts(env).smtp);
  stops.push({ name: 'mail capture', stop: capture.close });
  return capture.url;
}

export function dataRoot(env: Env, root: string): string {
  return env.GRIDLEAK_DATA_DIR ?? path.join(root, '.data');
}

/**
 * The hosted payment service when its key and signing secret are set; otherwise the local payment fake on
 * loopback, which posts its events to `webhookUrl` (this app's /api/payments/webhook).
 */
export async function resolvePayments(env: Env, stops: Stop[]): Promise<PaymentServiceConfig> {
  if (env.STRIPE_SECRET_KEY && env.STRIPE_WEBHOOK_SECRET)
    return { secretKey: env.STRIPE_SECRET_KEY, webhookSecret: env.STRIPE_WEBHOOK_SECRET };
  const fake = await startPaymentFake({ port: localPorts(env).payments, webhookUrl: localWebhookUrl(env) });
  stops.push({ name: 'local payment service', stop: fake.close });
  return { secretKey: fake.secretKey, webhookSecret: fake.webhookSecret, api: fake.api };
}

/** This process's webhook endpoint as the local fake reaches it: over loopback when listening on every address. */
function localWebhookUrl(env: Env): string {
  const host = listenHost(env);
  const reach = host === '0.0.0.0' || host === '::' ? '127.0.0.1' : host.includes(':') ? `[${host}]` : host;
  return `http://${reach}:${env.PORT}/api/payments/webhook`;
}
