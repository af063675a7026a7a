import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { expectAccessible } from '../support/axe';
import { watchConsole } from '../support/console';
import { newPage } from '../support/browser';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';
import { servicePdf } from '../factories/pdfs';
import { twoToneJpeg } from '../factories/images';

/** The canvas's read-only probe (see DEVELOPERS.md, "The markup canvas in journeys"). */
type Probe = {
  view: { scale: number };
  image: { width: number; height: number };
  stage: { width: number; height: number };
  imageToClient(x: number, y: number): { x: number; y: number };
};
type Side = 'diagram' | 'chassis';
type ProbeWindow = { __gridleakMarkup?: Probe; __gridleakMarkups?: Record<string, Probe> };
const scale = (page: Page) => page.evaluate(() => (window as unknown as ProbeWindow).__gridleakMarkup?.view.scale ?? 0);
const toClient = (page: Page, x: number, y: number) =>
  page.evaluate(([px, py]) => (window as unknown as ProbeWindow).__gridleakMarkup!.imageToClient(px!, py!), [x, y]);

const ctx = useProductAndBrowser();

// servicePdf draws R23's resistor on page 1 as a box 220–240 pt across and 280–340 pt down an A4 page (595 × 842 pt).
const ON_DIAGRAM = { x: 230 / 595.28, y: 310 / 841.89 };
const ON_CHASSIS = { x: 0.62, y: 0.48 };

/**
 * One canvas of the side-by-side view is zoomed past its fit onto the point, which sits near the middle of its
 * stage. The stage may still be settling after the navigation: both are read again until they agree.
 */
async function expectPaneZoomedOnto(page: Page, side: Side, at: { x: number; y: number }) {
  const state = () =>
    page.evaluate(
      ([name, px, py]) => {
        const probe = (window as unknown as ProbeWindow).__gridleakMarkups?.[name as string];
        const stage = document
          .querySelector(`[data-markup-probe="${name as string}"] [data-testid="markup-stage"]`)
          ?.getBoundingClientRect();
        if (!probe || !stage) return null;
        const fit = Math.min(probe.stage.width / probe.image.width, probe.stage.height / probe.image.height);
        const p = probe.imageToClient(px as number, py as number);
        const off = Math.max(
          Math.abs(p.x - (stage.x + stage.width / 2)) / stage.width,
          Math.abs(p.y - (stage.y + stage.height / 2)) / stage.height,
        );
        return { zoom: probe.view.scale / fit, off };
      },
      [side, at.x, at.y] as const,
    );
  // Generous waits, not timings: the page and both pictures load first on a busy machine.
  await expect.poll(async () => (await state())?.zoom ?? 0, { timeout: 30_000 }).toBeGreaterThan(1.5);
  await expect
    .poll(async () => (await state())?.off ?? Number.POSITIVE_INFINITY, { timeout: 30_000 })
    .toBeLessThan(0.1);
}

const paneBox = (page: Page, side: Side) => page.locator(`[data-markup-probe="${side}"]`).boundingBox();

describe('the service sheet beside the chassis', () => {
  it('when R23 is marked on a PDF diagram page and named by a finding on a chassis photo, then each opens both pictures zoomed onto it', async () => {
    const tech = await newPage(ctx.browser, { width: 1400, height: 950 });
    const techConsole = watchConsole(tech);
    await signInAs(tech, ctx.product.origin, 'mara@cobbold-lane.test');
    await tech.getByRole('link', { name: /OV-54-20417/ }).click();
    await tech.waitForURL(/\/restorations\/\d+/);
    const notebook = tech.url().match(/^.*\/restorations\/\d+/)![0];

    // A two-page PDF service sheet; the upload is held at the server's door for a moment, so its progress shows.
    await tech.getByRole('link', { name: 'Service sheet' }).click();
    await tech.route('**/api/restorations/*/sheets', async (route) => {
      if (route.request().method() === 'POST') await new Promise((r) => setTimeout(r, 1000));
      await route.continue();
    });
    await tech.getByLabel('Title (optional)').fill('Meridian 54 sheet');
    await tech.getByLabel('PDF or scan').setInputFiles({
      name: 'meridian-54.pdf',
      mimeType: 'application/pdf',
      buffer: await servicePdf(['Circuit diagram', 'Layout']),
    });
    await tech.getByRole('button', { name: 'Add to the sheet' }).click();
    await tech.getByRole('progressbar').first().waitFor();
    await tech.getByText('Added 2 pages.').waitFor({ timeout: 60_000 });
    await expect.poll(() => tech.getByRole('link', { name: /Meridian 54 sheet/ }).count()).toBe(2);
    await expectAccessible(tech, 'the service sheet');

    // R23 on the diagram (page 1).
    await tech
      .getByRole('link', { name: /Meridian 54 sheet/ })
      .first()
      .click();
    await tech.getByTestId('markup-stage').waitFor();
    await expect.poll(() => scale(tech)).toBeGreaterThan(0);
    await tech.getByLabel('Reference for the next mark').fill('R23');
    await tech.getByRole('button', { name: /^Pin/ }).click();
    const d = await toClient(tech, ON_DIAGRAM.x, ON_DIAGRAM.y);
    await tech.mouse.click(d.x, d.y);
    await tech.getByRole('status').filter({ hasText: 'R23 marked.' }).waitFor();
    await expect.poll(() => tech.getByRole('link', { name: 'Download the original file' }).count()).toBe(1);
    await expectAccessible(tech, 'a service sheet page');
    const diagramPage = tech.url();

    // A chassis photo, and a finding on it that names R23.
    await tech.goto(`${notebook}/photos`);
    await tech.getByLabel('View').first().selectOption('rear');
    await tech
      .locator('input[type=file][multiple]')
      .setInputFiles([{ name: 'rear.jpg', mimeType: 'image/jpeg', buffer: await twoToneJpeg(1600, 1200) }]);
    await tech
      .getByRole('button', { name: /Rear, before/ })
      .first()
      .click({ timeout: 30_000 });
    await tech.getByRole('link', { name: 'Mark up this photo' }).click();
    await tech.getByTestId('markup-stage').waitFor();
    await expect.poll(() => scale(tech)).toBeGreaterThan(0);
    await tech.getByRole('button', { name: /^Pin/ }).click();
    const c = await toClient(tech, ON_CHASSIS.x, ON_CHASSIS.y);
    await tech.mouse.click(c.x, c.y);
    const form = tech.getByRole('form', { name: 'New finding' });
    await form.getByLabel('Title').fill('Cathode resistor scorched');
    await form.getByLabel('Component reference').fill('R23');
    await form.getByRole('button', { name: 'Save finding' }).click();
    await tech.waitForURL(/\/findings\/\d+$/);
    const [, photoId, findingId] = tech
      .url()
      .match(/\/photos\/(\d+)\/findings\/(\d+)$/)!
      .map(Number);

    // From the finding: "on the diagram" opens both pictures, side by side, each zoomed onto R23.
    await tech.getByRole('link', { name: 'R23 on the diagram' }).click();
    await tech.waitForURL(/\/references\/R23\?finding=\d+&first=diagram$/);
    await expectPaneZoomedOnto(tech, 'diagram', ON_DIAGRAM);
    await expectPaneZoomedOnto(tech, 'chassis', ON_CHASSIS);
    const [left, right] = [await paneBox(tech, 'diagram'), await paneBox(tech, 'chassis')];
    expect(right!.x).toBeGreaterThanOrEqual(left!.x + left!.width);
    await expectAccessible(tech, 'a reference beside the diagram');

    // A mismatch note is shown on both pictures.
    await tech.getByLabel('The diagram says').fill('47k');
    await tech.getByLabel('The chassis has').fill('39k');
    await tech.getByRole('button', { name: 'Note the difference' }).click();
    const line = 'Differs from the diagram: R23: different value fitted; the diagram says 47k; the chassis has 39k';
    await expect.poll(() => tech.locator('figure figcaption').filter({ hasText: line }).count()).toBe(2);

    // From the diagram: "on the chassis" opens both again, the chassis asked for.
    await tech.goto(diagramPage);
    await tech.getByRole('link', { name: 'R23 on the chassis' }).click();
    await tech.waitForURL(/\/references\/R23\?diagram=\d+&first=chassis$/);
    await expectPaneZoomedOnto(tech, 'chassis', ON_CHASSIS);
    await expectPaneZoomedOnto(tech, 'diagram', ON_DIAGRAM);
    const referenceUrl = tech.url();

    // On a phone the two pictures come one after the other, the one asked for first.
    const phone = await newPage(ctx.browser, { width: 390, height: 844 });
    const phoneConsole = watchConsole(phone);
    await signInAs(phone, ctx.product.origin, 'mara@cobbold-lane.test');
    await phone.goto(referenceUrl);
    await expectPaneZoomedOnto(phone, 'chassis', ON_CHASSIS);
    const [top, below] = [await paneBox(phone, 'chassis'), await paneBox(phone, 'diagram')];
    expect(below!.y).toBeGreaterThanOrEqual(top!.y + top!.height);
    expect([...techConsole, ...phoneConsole]).toEqual([]);

    // The mentor reads the same view without tools, each picture still zoomed onto R23.
    const mentor = await newPage(ctx.browser, { width: 1400, height: 950 });
    const mentorConsole = watchConsole(mentor);
    await signInAs(mentor, ctx.product.origin, 'teodor@cobbold-lane.test');
    await mentor.goto(referenceUrl);
    await expectPaneZoomedOnto(mentor, 'chassis', ON_CHASSIS);
    await expectPaneZoomedOnto(mentor, 'diagram', ON_DIAGRAM);
    expect(await mentor.getByRole('button', { name: /^Pin/ }).count()).toBe(0);
    await expectAccessible(mentor, 'a reference as the mentor reads it');
    expect(mentorConsole).toEqual([]);

    // The owner sees what is shared only: nothing of R23 while the page, the photo and the finding are the workshop's.
    const owner = await newPage(ctx.browser, { width: 1400, height: 950 });
    const ownerConsole = watchConsole(owner);
    await signInAs(owner, ctx.product.origin, 'imogen@example.test');
    await owner.goto(referenceUrl);
    await owner.getByText(/R23 is not marked on a chassis photo yet/).waitFor();
    await owner.getByText(/R23 is not marked on a service sheet page yet/).waitFor();
    expect(await owner.locator('[data-markup-probe]').count()).toBe(0);

    const diagramPageId = Number(diagramPage.match(/\/sheets\/(\d+)/)![1]);
    const shared = await tech.evaluate(
      async ({ pageId, photo, finding }) => {
        const patch = (path: string) =>
          fetch(path, {
            method: 'PATCH',
            headers: { 'Content-Type': 'application/json' },
            body: JSON.stringify({ ownerVisible: true }),
          }).then((r) => r.status);
        return [
          await patch(`/api/sheet-pages/${pageId}`),
          await patch(`/api/photos/${photo}`),
          await patch(`/api/findings/${finding}`),
        ];
      },
      { pageId: diagramPageId, photo: photoId!, finding: findingId! },
    );
    expect(shared).toEqual([200, 200, 200]);

    // Once shared, the owner reads both pictures zoomed onto R23, without tools and without the unshared mismatch note.
    await owner.reload();
    await expectPaneZoomedOnto(owner, 'chassis', ON_CHASSIS);
    await expectPaneZoomedOnto(owner, 'diagram', ON_DIAGRAM);
    expect(await owner.getByRole('button', { name: /^Pin/ }).count()).toBe(0);
    expect(await owner.getByText(line).count()).toBe(0);
    await expectAccessible(owner, 'a reference as the owner reads it');
    expect(ownerConsole).toEqual([]);
  });
});
