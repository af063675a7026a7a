import type { ErrorRequestHandler, RequestHandler } from 'express';
import { HttpError, NotFoundError } from './errors';

/** Body-parser and multer style errors carry a status of their own. */
function statusFromLibrary(err: unknown): HttpError | undefined {
  const e = err as { status?: number; type?: string; message?: string };
  if (e?.type === 'entity.parse.failed') return new HttpError(400, 'bad_request', 'The request body is not valid JSON.');
  if (e?.type === 'entity.too.large') return new HttpError(413, 'too_large', 'The request body is too large.');
  if (typeof e?.status === 'number' && e.status >= 400 && e.status < 500)
    return new HttpError(e.status, 'bad_request', e.message ?? 'Bad request.');
  return undefined;
}

function pgConflict(err: unknown): HttpError | undefined {
  const code = (err as { cause?: { code?: string }; code?: string })?.cause?.code ?? (err as { code?: string })?.code;
  if (code === '23505') return new HttpError(409, 'conflict', 'That already exists.');
  if (code === '23503') return new HttpError(409, 'conflict', 'That refers to something that no longer exists.');
  return undefined;
}

/** The one place that turns thrown errors into `{ error: { code, message, details } }`. */
export const errorMiddleware: ErrorRequestHandler = (err, req, res, _next) => {
  const known = err instanceof HttpError ? err : (statusFromLibrary(err) ?? pgConflict(err));
  if (!known) {
    req.log?.error({ err }, 'unhandled error');
    res.status(500).json({ error: { code: 'internal', message: 'Something went wrong on our side. Try again in a moment.' } });
    return;
  }
  const body: { code: string; message: string; details?: unknown } = { code: known.code, message: known.message };
  if (known.details !== undefined) body.details = known.details;
  res.status(known.status).json({ error: body });
};

export const apiNotFound: RequestHandler = (req) => {
  throw new NotFoundError(`No API route ${req.method} ${req.path}.`);
};
