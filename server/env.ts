import { z } from 'zod';

/** Environment, parsed once at start-up. Unset service URLs mean "start the local stand-in". */
const envSchema = z
  .object({
    NODE_ENV: z.enum(['development', 'production', 'test']).default('development'),
    PORT: z.coerce.number().int().min(0).max(65535).default(5180),
    /** Address to listen on; unset means loopback only (127.0.0.1), e.g. 0.0.0.0 to accept other machines. */
    HOST: z.string().min(1).optional(),
    PUBLIC_URL: z.url({ message: 'must be a URL such as https://gridleak.example.org' }).optional(),
    DATABASE_URL: z
      .string()
      .refine(isPostgresUrl, 'must be a postgres:// or postgresql:// URL with a host and database name')
      .optional(),
    S3_ENDPOINT: z.url({ message: 'must be a URL such as https://s3.eu-west-1.amazonaws.com' }).optional(),
    S3_BUCKET: z.string().min(3).max(63).optional(),
    S3_REGION: z.string().min(1).default('us-east-1'),
    S3_ACCESS_KEY_ID: z.string().min(1).optional(),
    S3_SECRET_ACCESS_KEY: z.string().min(1).optional(),
    SMTP_URL: z
      .string()
      .refine((v) => /^smtps?:\/\/.+/.test(v), 'must be an smtp:// or smtps:// URL')
      .optional(),
    MAIL_FROM: z.string().default('Gridleak <no-reply@gridleak.local>'),
    /** The hosted payment service (Stripe); both unset means the local payment fake. */
    STRIPE_SECRET_KEY: z
      .string()
      .regex(/^(sk|rk)_(test|live)_\w+$/, 'must be a secret key such as sk_test_…')
      .optional(),
    STRIPE_WEBHOOK_SECRET: z
      .string()
      .regex(/^whsec_\w+$/, 'must be an endpoint signing secret such as whsec_…')
      .optional(),
    SESSION_SECRET: z.string().min(32, 'must be at least 32 characters').optional(),
    TRUST_PROXY: z.string().optional(),
    DEMO: z.enum(['true', 'false']).optional(),
    GRIDLEAK_DATA_DIR: z.string().optional(),
    GRIDLEAK_PORT_BASE: z.coerce.number().int().min(1024).max(65000).default(54329),
    UPLOAD_MAX_MB: z.coerce.number().positive().max(2048).default(40),
    UPLOAD_MAX_MEGAPIXELS: z.coerce.number().positive().max(1000).default(100),
    NOTIFICATION_WINDOW_SECONDS: z.coerce.number().int().min(0).max(86400).default(180),
    LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  })
  .superRefine((env, ctx) => {
    if (env.NODE_ENV === 'production' && !env.SESSION_SECRET)
      ctx.addIssue({ code: 'custom', path: ['SESSION_SECRET'], message: 'is required when NODE_ENV=production' });
    else if (env.HOST && !isLoopbackHost(env.HOST) && !env.SESSION_SECRET)
      ctx.addIssue({
        code: 'custom',
        path: ['SESSION_SECRET'],
        message: `is required when HOST=${env.HOST} lets other machines connect`,
      });
    if (!env.STRIPE_SECRET_KEY !== !env.STRIPE_WEBHOOK_SECRET)
      ctx.addIssue({
        code: 'custom',
        path: [env.STRIPE_SECRET_KEY ? 'STRIPE_WEBHOOK_SECRET' : 'STRIPE_SECRET_KEY'],
        message: `is required when ${env.STRIPE_SECRET_KEY ? 'STRIPE_SECRET_KEY' : 'STRIPE_WEBHOOK_SECRET'} is set`,
      });
    const s3 = ['S3_ENDPOINT', 'S3_BUCKET', 'S3_ACCESS_KEY_ID', 'S3_SECRET_ACCESS_KEY'] as const;
    const set = s3.filter((k) => env[k]);
    if (set.length > 0 && set.length < s3.length)
      for (const k of s3.filter((k) => !env[k]))
        ctx.addIssue({ code: 'custom', path: [k], message: `is required when ${set.join(', ')} is set` });
  });

export type Env = z.infer<typeof envSchema>;

function isPostgresUrl(value: string): boolean {
  try {
    const url = new URL(value);
    return /^postgres(ql)?:$/.test(url.protocol) && url.hostname !== '' && url.pathname.length > 1;
  } catch {
    return false;
  }
}

/** 127.0.0.0/8, ::1 and localhost reach only this machine. */
export function isLoopbackHost(host: string): boolean {
  return host === 'localhost' || host === '::1' || /^127(\.\d{1,3}){3}$/.test(host);
}

/** Where the server listens: loopback unless HOST says otherwise (development must not be reachable by accident). */
export const listenHost = (env: Env) => env.HOST ?? '127.0.0.1';

/** Settings that start but probably not as meant; printed at start-up. */
export function startupWarnings(env: Env): string[] {
  const warnings: string[] = [];
  if (env.NODE_ENV === 'production' && env.PUBLIC_URL?.startsWith('https:') && !env.TRUST_PROXY)
    warnings.push(
      'PUBLIC_URL is https but TRUST_PROXY is not set: the app sees plain HTTP from the load balancer, so session cookies will not be Secure. Set TRUST_PROXY (e.g. 1).',
    );
  return warnings;
}

export class EnvError extends Error {
  constructor(readonly problems: string[]) {
    super(problems.join('\n'));
  }
}

/** Parses the environment; throws EnvError listing every problem, one line each. */
export function parseEnv(source: NodeJS.ProcessEnv = process.env): Env {
  const cleaned = Object.fromEntries(Object.entries(source).filter(([, v]) => v !== undefined && v !== ''));
  const result = envSchema.safeParse(cleaned);
  if (result.success) return result.data;
  throw new EnvError(result.error.issues.map((i) => `${i.path.join('.') || 'environment'} ${i.message}`));
}

/** The origin browsers use to reach the app; cookie-authenticated writes must come from it. */
export function publicOrigin(env: Env, port: number): string {
  return env.PUBLIC_URL ? new URL(env.PUBLIC_URL).origin : `http://localhost:${port}`;
}

export const isDemo = (env: Env) => (env.DEMO ? env.DEMO === 'true' : env.NODE_ENV !== 'production');

/**
 * On loopback outside production a fixed development secret is used when none is set (production, and any
 * HOST other machines can reach, refuse to start without one), so local sessions survive restarts.
 */
export const sessionSecret = (env: Env) => env.SESSION_SECRET ?? 'gridleak-local-development-secret-not-for-production';

export const uploadLimits = (env: Env) => ({
  maxBytes: Math.round(env.UPLOAD_MAX_MB * 1024 * 1024),
  maxPixels: Math.round(env.UPLOAD_MAX_MEGAPIXELS * 1e6),
});
