import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError, NotFoundError } from './errors';
import { redactedError } from './redact-error';

/** Body-parser and multer style errors carry a status of their own. */
function statusFromLibrary(err: unknown): HttpError | undefined {
  const e = err as { status?: number; type?: string; message?: string };
  if (e?.type === 'entity.parse.failed')
    return new HttpError(400, 'bad_request', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new HttpError(413, 'too_large', 'The request body is too large.');
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500)
    return new HttpError(e.status, 'bad_request', e.message ?? 'Bad request.');
  return undefined;
}

/** PostgreSQL error classes a client's input can cause: conflicts (23) and unusable values (22). */
const PG_BAD_INPUT: Record<string, string> = {
  '22021': 'The request contains characters that cannot be stored (such as NUL).',
  '22P05': 'The request contains characters that cannot be stored.',
  '22003': 'A number in the request is out of range.',
  '22P02': 'A value in the request is not in the expected form.',
  '22001': 'A value in the request is too long.',
};

function pgConflict(err: unknown): HttpError | undefined {
  const code = (err as { cause?: { code?: string }; code?: string })?.cause?.code ?? (err as { code?: string })?.code;
  if (code === '23505') return new HttpError(409, 'conflict', 'That already exists.');
  if (code === '23503') return new HttpError(409, 'conflict', 'That refers to something that no longer exists.');
  if (code && PG_BAD_INPUT[code]) return new HttpError(400, 'bad_request', PG_BAD_INPUT[code]);
  return undefined;
}

/** The one place that turns thrown errors into `{ error: { code, message, details } }`. */
export const errorMiddleware: ErrorRequestHandler = (err, req, res, _next) => {
  const known = err instanceof HttpError ? err : (statusFromLibrary(err) ?? pgConflict(err));
  if (!known) {
    req.log?.error({ err: redactedError(err) }, 'unhandled error');
    res
      .status(500)
      .json({ error: { code: 'internal', message: 'Something went wrong on our side. Try again in a moment.' } });
    return;
  }
  const body: { code: string; message: string; details?: unknown } = { code: known.code, message: known.message };
  if (known.details !== undefined) body.details = known.details;
  res.status(known.status).json({ error: body });
};

export const apiNotFound: RequestHandler = (req) => {
  throw new NotFoundError(`No API route ${req.method} ${req.path}.`);
};
