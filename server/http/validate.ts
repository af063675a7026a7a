import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { BadRequestError } from './errors';

export interface Schemas {
  params?: z.ZodType;
  query?: z.ZodType;
  body?: z.ZodType;
}

export type Validated<S extends Schemas> = {
  [K in keyof S]: S[K] extends z.ZodType ? z.infer<S[K]> : never;
};

/**
 * Validates params, query and body with zod and puts the parsed values on res.locals.input
 * (Express 5's req.query is read-only). Anything not described is rejected as empty.
 */
export function validate<S extends Schemas>(schemas: S): RequestHandler {
  return (req, res, next) => {
    const input: Record<string, unknown> = {};
    const problems: { location: string; path: string; message: string }[] = [];
    for (const location of ['params', 'query', 'body'] as const) {
      const nul = findNul(req[location]);
      if (nul !== undefined)
        problems.push({ location, path: nul, message: 'contains a NUL character, which is never valid text' });
      const schema = schemas[location];
      if (!schema || nul !== undefined) continue;
      const result = schema.safeParse(req[location] ?? {});
      if (result.success) input[location] = result.data;
      else
        for (const issue of result.error.issues)
          problems.push({ location, path: issue.path.join('.'), message: issue.message });
    }
    if (problems.length > 0) {
      const first = problems[0]!;
      throw new BadRequestError(`${first.path || first.location}: ${first.message}`, problems);
    }
    res.locals.input = input;
    next();
  };
}

/** The path of the first string (or key) holding U+0000 in a parsed request part, if any. */
export function findNul(value: unknown, path = '', depth = 0): string | undefined {
  if (typeof value === 'string') return value.includes('\u0000') ? path : undefined;
  if (typeof value !== 'object' || value === null || depth > 32) return undefined;
  for (const [key, item] of Object.entries(value)) {
    const at = path ? `${path}.${key}` : key;
    if (key.includes('\u0000')) return at;
    const found = findNul(item, at, depth + 1);
    if (found !== undefined) return found;
  }
  return undefined;
}

/** Reads what validate() parsed, typed by the same schemas. */
export function input<S extends Schemas>(res: { locals: Record<string, unknown> }, _schemas: S): Validated<S> {
  return res.locals.input as Validated<S>;
}
