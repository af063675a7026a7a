import type { Browser } from 'playwright-core';
import { afterAll, beforeAll } from 'vitest';
import { launchBrowser } from './browser';
import { startProduct } from './start-product';

/** One started product and one browser for a journey file; both are stopped after its tests. */
export function useProductAndBrowser() {
  const ctx = {} as { product: Awaited<ReturnType<typeof startProduct>>; browser: Browser };
  beforeAll(async () => {
    [ctx.product, ctx.browser] = await Promise.all([startProduct(), launchBrowser()]);
  });
  afterAll(async () => {
    await ctx.browser?.close();
    await ctx.product?.stop();
  });
  return ctx;
}
