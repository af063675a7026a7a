import { describe, expect, it } from 'vitest';
import { findingsListCache } from './findings-cache';

const json = (n: number) => async () => 'x'.repeat(n);

describe('findings list cache', () => {
  it('when entries pass the byte cap, then the least recently used go first and the total stays within the cap', async () => {
    const cache = findingsListCache(1000);
    await cache.read(1, 'technician', 1, json(400));
    await cache.read(2, 'technician', 1, json(400));
    await cache.read(1, 'technician', 1, json(400)); // photo 1 used again: photo 2 is now the oldest
    await cache.read(3, 'technician', 1, json(400));
    expect(cache.size).toBe(2);
    expect(cache.bytes).toBe(800);
    let built = 0;
    await cache.read(1, 'technician', 1, async () => String(++built));
    expect(built).toBe(0); // still held
    await cache.read(2, 'technician', 1, async () => String(++built));
    expect(built).toBe(1); // was dropped, built again
  });

  it('when a compressed copy is kept with an entry, then it counts against the cap too', async () => {
    const cache = findingsListCache(1000);
    const first = await cache.read(1, 'owner', 1, json(300));
    await cache.read(2, 'owner', 1, json(300));
    first.account(200);
    expect(cache.bytes).toBe(800);
    const second = await cache.read(2, 'owner', 1, json(300));
    second.account(300); // 1,100 bytes: photo 1's entry, the oldest, goes
    expect(cache.size).toBe(1);
    expect(cache.bytes).toBe(600);
  });

  it('when the version moves on, then the entry is built again and replaces the old one', async () => {
    const cache = findingsListCache(1000);
    await cache.read(1, 'mentor', 1, json(100));
    const next = await cache.read(1, 'mentor', 2, json(150));
    expect(next.version).toBe(2);
    expect(cache.size).toBe(1);
    expect(cache.bytes).toBe(150);
  });
});
