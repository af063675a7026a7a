import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { BadRequestError } from './errors';

interface Schemas {
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
      const schema = schemas[location];
      if (!schema) continue;
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

/** Reads what validate() parsed, typed by the same schemas. */
export function input<S extends Schemas>(res: { locals: Record<string, unknown> }, _schemas: S): Validated<S> {
  return res.locals.input as Validated<S>;
}
