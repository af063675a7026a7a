import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { expectAccessible } from '../support/axe';
import { launchBrowser, newPage } from '../support/browser';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser?.close());

// The journeys rely on this helper to fail; it is checked on pages whose faults are known (WCAG 2.1 1.1.1, 4.1.2).
describe('the accessibility check used by the journeys', () => {
  it('when an image has no text alternative and a field no label, then it fails naming both rules', async () => {
    const page = await newPage(browser);
    await page.setContent(
      '<html lang="en"><head><title>Faulty</title></head><body><main><img src="data:image/gif;base64,R0lGODlhAQABAAAAACw="><input type="text"></main></body></html>',
    );
    const failure = (await expectAccessible(page, 'a faulty page').then(
      () => undefined,
      (err: { actual?: unknown }) => err,
    )) as { actual?: string[] } | undefined;
    expect(failure?.actual).toEqual(
      expect.arrayContaining([expect.stringMatching(/^image-alt /), expect.stringMatching(/^label /)]),
    );
  });

  it('when the same content is labelled, then it passes', async () => {
    const page = await newPage(browser);
    await page.setContent(
      '<html lang="en"><head><title>Fixed</title></head><body><main><h1>Bench</h1><img alt="Chassis underside" src="data:image/gif;base64,R0lGODlhAQABAAAAACw="><label>Serial <input type="text"></label></main></body></html>',
    );
    await expectAccessible(page, 'a labelled page');
  });
});
