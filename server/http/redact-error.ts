/**
 * pino's `err` serializer for Gridleak: what a failed query did, never the values it carried. Drizzle puts
 * the parameters in the message (`Failed query: …\nparams: …`), and PostgreSQL's `detail` repeats row
 * values ("Failing row contains (…)"), so a failed insert would otherwise log a password hash.
 */
export function redactedError(err: unknown, depth = 0): unknown {
  // Errors, or what pino's standard serializer made of one (pino-http runs it before ours).
  if (typeof err !== 'object' || err === null || depth > 5) return err;
  const e = err as Record<string, unknown>;
  const text = (v: unknown) => (typeof v === 'string' ? withoutParams(v) : undefined);
  const out: Record<string, unknown> = {
    // A second pass (pino-http's standard serializer, then this) keeps the first pass's name.
    type:
      err instanceof Error
        ? err.constructor.name
        : typeof e.name === 'string'
          ? e.name
          : typeof e.type === 'string'
            ? e.type
            : 'Error',
    message: text(e.message),
    stack: text(e.stack),
  };
  out.name = out.type;
  // Identifiers and the SQL text (with $1 placeholders) are safe; values are not.
  for (const key of [
    'code',
    'status',
    'severity',
    'constraint',
    'table',
    'column',
    'schema',
    'routine',
    'query',
  ] as const)
    if (typeof e[key] === 'string' || typeof e[key] === 'number') out[key] = e[key];
  if (Array.isArray(e.params)) out.params = `[${e.params.length} redacted]`;
  if (e.cause !== undefined) out.cause = redactedError(e.cause, depth + 1);
  return out;
}

/** Cuts drizzle's "params:" block (up to the first stack frame) out of a message or stack. */
export function withoutParams(text: string): string {
  return text.replace(/\nparams: [\s\S]*?(?=\n\s+at |$)/, '\nparams: [redacted]');
}
