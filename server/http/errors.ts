/** Typed errors that services throw; the error middleware maps them to status and shape. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export class BadRequestError extends HttpError {
  constructor(message: string, details?: unknown) {
    super(400, 'bad_request', message, details);
  }
}
export class UnauthorizedError extends HttpError {
  constructor(message = 'Sign in to continue.') {
    super(401, 'unauthorized', message);
  }
}
export class ForbiddenError extends HttpError {
  constructor(message = 'Your role on this restoration does not allow that.') {
    super(403, 'forbidden', message);
  }
}
export class NotFoundError extends HttpError {
  constructor(message = 'Not found.') {
    super(404, 'not_found', message);
  }
}
export class ConflictError extends HttpError {
  constructor(message: string, details?: unknown) {
    super(409, 'conflict', message, details);
  }
}
export class TooManyRequestsError extends HttpError {
  constructor(message = 'Too many attempts; wait a few minutes and try again.') {
    super(429, 'too_many_requests', message);
  }
}
/** The mail server did not take a message that is the point of the action; nothing of the action was kept. */
export class MailUnavailableError extends HttpError {
  constructor(message = 'We could not send the e-mail just now, so nothing was saved. Try again in a few minutes.') {
    super(503, 'mail_unavailable', message);
  }
}
