import { createHash, randomBytes } from 'node:crypto';

/** A URL-safe random token; only its SHA-256 is stored, so a database leak does not leak live links. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');
