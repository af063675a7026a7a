import { DrizzleQueryError } from 'drizzle-orm';
import { pino } from 'pino';
import { describe, expect, it } from 'vitest';
import { redactedError } from './redact-error';

const hash = '$argon2id$v=19$m=19456,t=2,p=1$c2FsdHNhbHQ$aGFzaGhhc2hoYXNo';

function failedInsert() {
  const cause = Object.assign(new Error('null value in column "name" violates not-null constraint'), {
    code: '23502',
    table: 'users',
    column: 'name',
    detail: `Failing row contains (7, null, a@example.test, ${hash}).`,
  });
  return new DrizzleQueryError(
    'insert into "users" ("name", "email", "password_hash") values ($1, $2, $3)',
    [null, 'a@example.test', hash],
    cause,
  );
}

describe('error logging', () => {
  it('when a query fails, then the logged error keeps the SQL, code and table but no parameter or row value', () => {
    const lines: string[] = [];
    const logger = pino({ serializers: { err: redactedError } }, { write: (l: string) => void lines.push(l) });
    logger.error({ err: failedInsert() }, 'unhandled error');
    const line = lines.join('');
    expect(line).toContain('insert into \\"users\\"');
    expect(line).toContain('23502');
    expect(line).toContain('not-null constraint');
    expect(line).not.toContain('argon2id');
    expect(line).not.toContain('a@example.test');
  });

  it('when pino’s standard serializer ran first (as pino-http does), then the result is still redacted', () => {
    const standard = pino.stdSerializers.err(failedInsert());
    expect(JSON.stringify(standard)).toContain('argon2id'); // what would reach the log without redaction
    expect(JSON.stringify(redactedError(standard))).not.toContain('argon2id');
  });
});
