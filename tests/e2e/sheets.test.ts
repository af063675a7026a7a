import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { describe, expect, it } from 'vitest';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

/** The canvas's read-only probe (see DEVELOPERS.md, "The markup canvas in journeys"). */
type Probe = { view: { scale: number }; stage: { width: number; height: number }; imageToClient(x: number, y: number): { x: number; y: number } };
const scale = (page: Page) => page.evaluate(() => (window as unknown as { __gridleakMarkup?: Probe }).__gridleakMarkup?.view.scale ?? 0);
const toClient = (page: Page, x: number, y: number) =>
  page.evaluate(([px, py]) => (window as unknown as { __gridleakMarkup: Probe }).__gridleakMarkup.imageToClient(px!, py!), [x, y]);

const ctx = useProductAndBrowser();

/** A white diagram page with a few thin lines. */
const diagramPng = () =>
  sharp({ create: { width: 1600, height: 1100, channels: 3, background: '#ffffff' } })
    .composite([{ input: Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="1600" height="1100"><path d="M100 300 H1500 M640 200 V900" stroke="#000" stroke-width="2" fill="none"/><rect x="620" y="320" width="40" height="120" stroke="#000" fill="none" stroke-width="2"/></svg>'), top: 0, left: 0 }])
    .png()
    .toBuffer();

const ON_DIAGRAM = { x: 0.4, y: 0.34 };
const ON_CHASSIS = { x: 0.62, y: 0.48 };

/** Places a pin with a reference at a normalised point of the picture on screen. */
async function markAt(page: Page, ref: string, at: { x: number; y: number }) {
  await page.getByTestId('markup-stage').waitFor();
  await expect.poll(() => scale(page)).toBeGreaterThan(0);
  await page.getByLabel('Reference for the next mark').fill(ref);
  await page.getByRole('button', { name: /^Pin/ }).click();
  const p = await toClient(page, at.x, at.y);
  await page.mouse.click(p.x, p.y);
  await page.getByRole('status').filter({ hasText: `${ref} marked.` }).waitFor();
}

/** The point is shown near the middle of the stage, at more than the fit zoom. */
async function expectZoomedOnto(page: Page, at: { x: number; y: number }, fitScale: number) {
  await expect.poll(() => scale(page)).toBeGreaterThan(fitScale * 1.5);
  // The stage may still be settling after the navigation: read the stage and the probe again until both are there.
  const offCentre = async () => {
    const box = await page.getByTestId('markup-stage').boundingBox();
    const p = await page.evaluate(([px, py]) => (window as unknown as { __gridleakMarkup?: Probe }).__gridleakMarkup?.imageToClient(px!, py!) ?? null, [at.x, at.y]);
    if (!box || !p) return Number.POSITIVE_INFINITY;
    return Math.max(Math.abs(p.x - (box.x + box.width / 2)) / box.width, Math.abs(p.y - (box.y + box.height / 2)) / box.height);
  };
  await expect.poll(offCentre).toBeLessThan(0.1);
}

describe('the service sheet beside the chassis', () => {
  it('when R23 is marked on a diagram page and on a chassis photo, then each links to the other, zoomed onto the part', async () => {
    const tech = await newPage(ctx.browser, { width: 1400, height: 950 });
    await signInAs(tech, ctx.product.origin, 'mara@cobbold-lane.test');
    await tech.getByRole('link', { name: /OV-54-20417/ }).click();
    await tech.getByRole('link', { name: 'Service sheet' }).click();
    await tech.getByLabel('Title (optional)').fill('Sheet 1, audio stages');
    await tech.getByLabel('Scan').setInputFiles({ name: 'diagram.png', mimeType: 'image/png', buffer: await diagramPng() });
    await tech.getByRole('button', { name: 'Add page' }).click();
    await tech.getByText('Added one page.').waitFor();
    await expectAccessible(tech, 'the service sheet');

    await tech.getByRole('link', { name: /Sheet 1, audio stages/ }).click();
    await markAt(tech, 'R23', ON_DIAGRAM);
    const diagramFit = await scale(tech);
    await expectAccessible(tech, 'a service sheet page');

    await tech.getByRole('link', { name: 'Back to the service sheet' }).click();
    await tech.getByRole('navigation', { name: 'Mark references on a chassis photo' }).getByRole('link').first().click();
    await markAt(tech, 'R23', ON_CHASSIS);
    const chassisFit = await scale(tech);

    // From the chassis mark: "on the diagram" opens the page zoomed onto the symbol.
    await tech.getByRole('link', { name: 'on the diagram' }).click();
    await tech.waitForURL(/\/sheets\/\d+\?mark=\d+$/);
    await expectZoomedOnto(tech, ON_DIAGRAM, diagramFit);

    // And back: "on the chassis" opens the photo zoomed onto the part.
    await tech.getByRole('link', { name: 'on the chassis' }).click();
    await tech.waitForURL(/\/sheets\/chassis\/\d+\?mark=\d+$/);
    await expectZoomedOnto(tech, ON_CHASSIS, chassisFit);

    await tech.getByRole('link', { name: 'Back to the service sheet' }).click();
    const row = tech.getByRole('row', { name: /R23/ });
    await expect.poll(async () => (await row.getByRole('cell').allTextContents()).slice(0, 2)).toEqual(['1', '1']);
  });
});
