import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { artifactPath } from '../support/artifacts';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

/** The canvas's read-only probe (see DEVELOPERS.md, "The markup canvas in journeys"). */
type Probe = {
  view: { scale: number };
  stage: { width: number; height: number };
  imageToClient(x: number, y: number): { x: number; y: number };
};
const probe = (page: Page) =>
  page.evaluate(() => (window as unknown as { __gridleakMarkup?: Probe }).__gridleakMarkup?.view.scale ?? 0);
const focusedTestId = (page: Page) =>
  page.evaluate(() => document.activeElement?.getAttribute('data-testid') ?? document.activeElement?.tagName ?? '');

const ctx = useProductAndBrowser();

async function openUnderside(page: Page) {
  await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
  await page.getByRole('link', { name: /OV-54-20417/ }).click();
  await page.getByRole('link', { name: 'Photos' }).click();
  await page
    .getByRole('button', { name: /Underside, before/ })
    .first()
    .click();
  await page.getByRole('link', { name: 'Mark up this photo' }).click();
  await page.getByTestId('markup-stage').waitFor();
  await expect.poll(() => probe(page)).toBeGreaterThan(0);
}

describe('markup without a pointer', () => {
  it('when the technician tabs to the photo, moves the crosshair, presses P and Enter and types, then the finding is saved there and the tool is Select again', async () => {
    const page = await newPage(ctx.browser, { width: 1400, height: 950 });
    const messages = watchConsole(page);
    await openUnderside(page);
    await page.getByRole('link', { name: 'Back to the photos' }).focus();
    for (let i = 0; i < 40 && (await focusedTestId(page)) !== 'markup-stage'; i++) await page.keyboard.press('Tab');
    expect(await focusedTestId(page)).toBe('markup-stage');
    await page.getByTestId('markup-crosshair').waitFor();
    const live = page.getByTestId('markup-crosshair-position');
    await expect.poll(() => live.textContent()).toMatch(/^\d+ % across, \d+ % down/);
    const before = (await live.textContent())!;
    await page.keyboard.press('Shift+ArrowLeft');
    await page.keyboard.press('ArrowUp');
    await expect.poll(() => live.textContent()).not.toBe(before);
    await expectAccessible(page, 'the markup page with the keyboard crosshair');
    const heard = (await live.textContent())!;
    const [across, down] = heard.match(/\d+/g)!.map(Number);

    await page.keyboard.press('p');
    await page.keyboard.press('Enter');
    const form = page.getByRole('form', { name: 'New finding' });
    await form.waitFor();
    await expect.poll(() => page.evaluate(() => document.activeElement?.getAttribute('name'))).toBe('title');
    await page.keyboard.type('Keyboard check: scorched tag on the mains dropper?');
    await page.keyboard.press('Tab');
    await page.keyboard.type('R31');
    await page.keyboard.press('Enter');
    await page.waitForURL(/\/findings\/\d+$/);
    const id = Number(page.url().split('/').pop());
    const stored = await page.evaluate(
      async (fid) =>
        (await (await fetch(`/api/findings/${fid}`)).json()) as {
          shape: string;
          componentRef: string;
          points: { x: number; y: number }[];
        },
      id,
    );
    expect(stored.shape).toBe('pin');
    expect(stored.componentRef).toBe('R31');
    // Where screen readers were told the crosshair was, to the per cent they heard.
    expect(Math.abs(stored.points[0]!.x * 100 - across!)).toBeLessThanOrEqual(0.5);
    expect(Math.abs(stored.points[0]!.y * 100 - down!)).toBeLessThanOrEqual(0.5);
    expect(await page.getByRole('button', { name: 'Select' }).getAttribute('aria-pressed')).toBe('true');
    // Focus is back on the photo for the next finding.
    await expect.poll(() => focusedTestId(page)).toBe('markup-stage');
    await page.screenshot({ path: artifactPath('markup-keyboard.png') });

    // Room: on a wide screen the photo takes most of the width, and all of it once the finding panel is folded away.
    const withPanel = (await page.getByTestId('markup-stage').boundingBox())!.width;
    expect(withPanel).toBeGreaterThan(1400 * 0.6);
    await page.getByRole('button', { name: 'Hide the finding panel' }).click();
    await expect
      .poll(async () => (await page.getByTestId('markup-stage').boundingBox())!.width)
      .toBeGreaterThan(1400 * 0.9);
    expect(await page.getByRole('complementary', { name: 'Finding' }).isVisible()).toBe(false);
    await page.reload();
    await page.getByRole('button', { name: 'Show the finding panel' }).click();
    await page.getByRole('complementary', { name: 'Finding' }).waitFor();
    expect(messages).toEqual([]);
  });
});

describe('markup on a phone', () => {
  it('when a pin is placed low on the photo, then the photo stays on screen and the pin in sight above the new finding sheet', async () => {
    const page = await newPage(ctx.browser, { width: 390, height: 844 });
    const messages = watchConsole(page);
    await openUnderside(page);
    // The photo's lower edge at the bottom of the screen, as when the page is scrolled down to it.
    await page.getByTestId('markup-stage').evaluate((el) => el.scrollIntoView({ block: 'end' }));
    await expect.poll(() => probe(page)).toBeGreaterThan(0);
    const scrolled = await page.evaluate(() => window.scrollY);
    await page.getByRole('button', { name: /^Pin/ }).click();
    // Low on the photo, where the sheet will open.
    const target = await page.evaluate(() =>
      (window as unknown as { __gridleakMarkup: Probe }).__gridleakMarkup.imageToClient(0.5, 0.93),
    );
    expect(target.y).toBeGreaterThan(844 * 0.55);
    expect(target.y).toBeLessThan(844);
    await page.mouse.click(target.x, target.y);
    const form = page.getByRole('form', { name: 'New finding' });
    await form.waitFor();
    // The page never scrolls the photo away (it may bring it up): the photo's top is on screen, above the sheet.
    expect(await page.evaluate(() => window.scrollY)).toBeGreaterThanOrEqual(scrolled);
    const after = (await page.getByTestId('markup-stage').boundingBox())!;
    expect(after.y).toBeGreaterThanOrEqual(0);
    // A sheet over the bottom of the screen, not the page's end.
    const sheet = (await page.getByTestId('new-finding-sheet').boundingBox())!;
    expect(sheet.y + sheet.height).toBeCloseTo(844, 0);
    expect(sheet.y).toBeGreaterThan(844 / 2);
    expect(await form.getByLabel('Title').evaluate((el) => el === document.activeElement)).toBe(true);
    const pendingAt = await pendingClientPoint(page);
    expect(pendingAt.y).toBeGreaterThan(0);
    expect(pendingAt.y).toBeLessThan(sheet.y);
    expect(pendingAt.x).toBeGreaterThan(0);
    expect(pendingAt.x).toBeLessThan(390);
    expect(pendingAt.y).toBeGreaterThanOrEqual(after.y);
    await expectAccessible(page, 'the new finding sheet on a phone');
    await page.screenshot({ path: artifactPath('markup-phone-sheet.png') });
    await form.getByRole('button', { name: 'Cancel' }).click();
    expect(messages).toEqual([]);
  });
});

/** The waiting mark's place on screen, from the probe's `pending` point. */
async function pendingClientPoint(page: Page) {
  return page.evaluate(() => {
    const p = (window as unknown as { __gridleakMarkup: Probe & { pending?: { x: number; y: number } } })
      .__gridleakMarkup;
    if (!p.pending) throw new Error('no mark is waiting');
    return p.imageToClient(p.pending.x, p.pending.y);
  });
}
