import { describe, expect, it } from 'vitest';
import { EnvError, listenHost, parseEnv, startupWarnings } from './env';

function problems(env: Record<string, string>): string[] {
  try {
    parseEnv(env);
    return [];
  } catch (err) {
    if (err instanceof EnvError) return err.problems;
    throw err;
  }
}

describe('environment', () => {
  it('when nothing is set, then the local defaults apply', () => {
    const env = parseEnv({});
    expect(env.PORT).toBe(5180);
    expect(env.DATABASE_URL).toBeUndefined();
  });

  it('when DATABASE_URL is malformed, then one line names it', () => {
    const lines = problems({ DATABASE_URL: 'postgres//nohost' });
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^DATABASE_URL must be a postgres/);
  });

  it('when production runs without SESSION_SECRET, then start-up is refused', () => {
    expect(problems({ NODE_ENV: 'production' })).toEqual(['SESSION_SECRET is required when NODE_ENV=production']);
  });

  it('when only part of the S3 settings is given, then each missing one is named', () => {
    const lines = problems({ S3_ENDPOINT: 'https://s3.example.test' });
    expect(lines).toEqual(
      expect.arrayContaining([
        expect.stringMatching(/^S3_BUCKET is required/),
        expect.stringMatching(/^S3_SECRET_ACCESS_KEY/),
      ]),
    );
  });

  it('when only one of the payment service settings is given, or one is malformed, then start-up names it', () => {
    expect(problems({ STRIPE_SECRET_KEY: 'sk_test_abc123' })).toEqual([
      'STRIPE_WEBHOOK_SECRET is required when STRIPE_SECRET_KEY is set',
    ]);
    expect(problems({ STRIPE_WEBHOOK_SECRET: 'whsec_abc123' })).toEqual([
      'STRIPE_SECRET_KEY is required when STRIPE_WEBHOOK_SECRET is set',
    ]);
    expect(problems({ STRIPE_SECRET_KEY: 'pk_test_abc123', STRIPE_WEBHOOK_SECRET: 'whsec_abc123' })).toEqual([
      expect.stringMatching(/^STRIPE_SECRET_KEY must be a secret key/),
    ]);
    expect(
      parseEnv({ STRIPE_SECRET_KEY: 'sk_test_abc123', STRIPE_WEBHOOK_SECRET: 'whsec_abc123' }).STRIPE_SECRET_KEY,
    ).toBe('sk_test_abc123');
  });

  it('when PORT is not a number, then it is reported with the others', () => {
    const lines = problems({ PORT: 'eighty', PUBLIC_URL: 'not a url' });
    expect(lines).toHaveLength(2);
  });

  it('when HOST is not set, then the server listens on loopback only', () => {
    expect(listenHost(parseEnv({}))).toBe('127.0.0.1');
    expect(listenHost(parseEnv({ HOST: '0.0.0.0', SESSION_SECRET: 'x'.repeat(32) }))).toBe('0.0.0.0');
  });

  it('when HOST lets other machines in without SESSION_SECRET, then start-up is refused; loopback keeps the local secret', () => {
    expect(problems({ HOST: '0.0.0.0' })).toEqual([
      expect.stringMatching(/^SESSION_SECRET is required when HOST=0\.0\.0\.0/),
    ]);
    expect(problems({ HOST: '192.0.2.10' })).toHaveLength(1);
    expect(problems({ HOST: '127.0.0.1' })).toEqual([]);
    expect(problems({ HOST: '::1' })).toEqual([]);
  });

  it('when production serves an https address without TRUST_PROXY, then start-up warns that cookies will not be Secure', () => {
    const base = { NODE_ENV: 'production', SESSION_SECRET: 'x'.repeat(32), PUBLIC_URL: 'https://gridleak.example.org' };
    expect(startupWarnings(parseEnv(base))).toEqual([expect.stringMatching(/TRUST_PROXY.*not be Secure/)]);
    expect(startupWarnings(parseEnv({ ...base, TRUST_PROXY: '1' }))).toEqual([]);
    expect(startupWarnings(parseEnv({ ...base, PUBLIC_URL: 'http://gridleak.example.org' }))).toEqual([]);
    expect(startupWarnings(parseEnv({ ...base, NODE_ENV: 'development' }))).toEqual([]);
  });
});
