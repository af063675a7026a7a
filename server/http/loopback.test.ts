import type { Request } from 'express';
import { describe, expect, it } from 'vitest';
import { isLoopbackRequest } from './loopback';

const request = (remoteAddress: string, headers: Record<string, string> = {}) =>
  ({ socket: { remoteAddress }, headers }) as unknown as Request;

describe('requests from this machine', () => {
  it.each(['127.0.0.1', '127.1.2.3', '::1', '::ffff:127.0.0.1'])(
    'when the socket comes from %s, then it is this machine',
    (address) => {
      expect(isLoopbackRequest(request(address))).toBe(true);
    },
  );

  it.each(['192.0.2.7', '::ffff:192.0.2.7', '2001:db8::1', '0.0.0.0', ''])(
    'when the socket comes from %j, then it is not',
    (address) => {
      expect(isLoopbackRequest(request(address))).toBe(false);
    },
  );

  it('when a local proxy relays the request (forwarding headers), then it is not, whatever the socket says', () => {
    expect(isLoopbackRequest(request('127.0.0.1', { 'x-forwarded-for': '203.0.113.9' }))).toBe(false);
    expect(isLoopbackRequest(request('127.0.0.1', { forwarded: 'for=203.0.113.9' }))).toBe(false);
  });
});
