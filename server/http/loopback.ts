import type { Request } from 'express';

const LOOPBACK = /^(127(\.\d{1,3}){3}|::1|::ffff:127(\.\d{1,3}){3})$/;

/**
 * True when the request comes from this machine and not through a proxy: the socket's own address, never
 * X-Forwarded-For (which anyone can send), and no forwarding headers (a local proxy relays other machines).
 */
export function isLoopbackRequest(req: Request): boolean {
  if (req.headers['x-forwarded-for'] !== undefined || req.headers.forwarded !== undefined) return false;
  return LOOPBACK.test(req.socket.remoteAddress ?? '');
}
