import { describe, expect, it } from 'vitest';
import { EnvError, parseEnv } from './env';

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
    expect(lines).toEqual(expect.arrayContaining([expect.stringMatching(/^S3_BUCKET is required/), expect.stringMatching(/^S3_SECRET_ACCESS_KEY/)]));
  });

  it('when PORT is not a number, then it is reported with the others', () => {
    const lines = problems({ PORT: 'eighty', PUBLIC_URL: 'not a url' });
    expect(lines).toHaveLength(2);
  });
});
