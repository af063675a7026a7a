import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { apiErrorCodes } from '../../shared/schemas/errors';

const serverRoot = path.resolve(import.meta.dirname, '..');
const sources = (dir: string): string[] =>
  readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const full = path.join(dir, e.name);
    if (e.isDirectory()) return sources(full);
    return e.name.endsWith('.ts') && !e.name.endsWith('.test.ts') ? [full] : [];
  });

// The client and its test fakes branch on these codes, so the server may answer only with codes in the shared list.
describe('API error codes', () => {
  it('when the server builds an error answer, then its code is one of the shared list', () => {
    const used = new Set<string>();
    for (const file of sources(serverRoot)) {
      const text = readFileSync(file, 'utf8');
      for (const m of text.matchAll(/(?:HttpError\(|super\()\s*\d{3},\s*'([^']+)'/g)) used.add(m[1]!);
      for (const m of text.matchAll(/error: \{ code: '([^']+)'/g)) used.add(m[1]!);
    }
    expect(used.size).toBeGreaterThan(8);
    expect([...used].filter((code) => !(apiErrorCodes as readonly string[]).includes(code))).toEqual([]);
  });
});
