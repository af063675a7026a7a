import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { chassisLandmarks } from '../../server/features/demo/chassis';
import { artifactPath } from '../support/artifacts';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { mailTo, signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

/** The canvas's read-only probe (see DEVELOPERS.md, "The markup canvas in journeys"). */
type Probe = {
  view: { scale: number };
  image: { width: number; height: number };
  imageToClient(x: number, y: number): { x: number; y: number };
};
const probe = (page: Page) =>
  page.evaluate(() => (window as unknown as { __gridleakMarkup: Probe }).__gridleakMarkup.view.scale);
const toClient = (page: Page, x: number, y: number) =>
  page.evaluate(
    ([px, py]) => (window as unknown as { __gridleakMarkup: Probe }).__gridleakMarkup.imageToClient(px!, py!),
    [x, y],
  );

const ctx = useProductAndBrowser();

// A spot on the demo underside picture: the V4 tag strip, away from the seeded findings.
const TARGET = { x: 0.3, y: 0.62 };

describe('marking a spot and talking about it', () => {
  it('when the technician pins a spot, then the mentor sees it at the same place and replies, and the owner sees it only once shared', async () => {
    const tech = await newPage(ctx.browser, { width: 1400, height: 950 });
    const techConsole = watchConsole(tech);
    await signInAs(tech, ctx.product.origin, 'mara@cobbold-lane.test');
    await tech.getByRole('link', { name: /OV-54-20417/ }).click();
    await tech.getByRole('link', { name: 'Photos' }).click();
    await tech
      .getByRole('button', { name: /Underside, before/ })
      .first()
      .click();
    await tech.getByRole('link', { name: 'Mark up this photo' }).click();
    await tech.getByTestId('markup-stage').waitFor();
    await expect.poll(() => probe(tech)).toBeGreaterThan(0);

    await expectAccessible(tech, 'the markup page');
    await tech.getByRole('button', { name: /^Pin/ }).click();
    const at = await toClient(tech, TARGET.x, TARGET.y);
    await tech.mouse.click(at.x, at.y);
    const form = tech.getByRole('form', { name: 'New finding' });
    await form.getByLabel('Title').fill('Dry joint on the V4 tag strip?');
    await form.getByLabel('Component reference').fill('R14');
    await form.getByRole('button', { name: 'Save finding' }).click();
    await tech.waitForURL(/\/findings\/\d+$/);
    const findingUrl = tech.url();
    const findingId = Number(findingUrl.split('/').pop());
    const stored = await tech.evaluate(
      async (id) => (await (await fetch(`/api/findings/${id}`)).json()) as { points: { x: number; y: number }[] },
      findingId,
    );
    const fitScale = await probe(tech);
    const image = await tech.evaluate(() => (window as unknown as { __gridleakMarkup: Probe }).__gridleakMarkup.image);
    // Stored in image space: within 1 screen pixel of where it was clicked, at this zoom.
    expect(Math.abs(stored.points[0]!.x - TARGET.x) * image.width * fitScale).toBeLessThan(1);
    expect(Math.abs(stored.points[0]!.y - TARGET.y) * image.height * fitScale).toBeLessThan(1);

    const mentor = await newPage(ctx.browser, { width: 1100, height: 800 });
    const mentorConsole = watchConsole(mentor);
    await signInAs(mentor, ctx.product.origin, 'teodor@cobbold-lane.test');
    await mentor.goto(findingUrl);
    await mentor.getByText('Dry joint on the V4 tag strip?').first().waitFor();
    await mentor.getByTestId('markup-stage').click({ position: { x: 5, y: 5 } });
    await mentor.keyboard.press('Escape');
    await mentor.keyboard.press('0');
    await expect.poll(() => probe(mentor)).toBeGreaterThan(0);
    // At fit zoom on another screen size, the pin is where the technician put it: clicking there selects it.
    await mentor.goto(`${ctx.product.origin}${new URL(findingUrl).pathname.replace(/\/findings\/\d+$/, '')}`);
    await mentor.getByTestId('markup-stage').waitFor();
    await expect.poll(() => probe(mentor)).toBeGreaterThan(0);
    const there = await toClient(mentor, stored.points[0]!.x, stored.points[0]!.y);
    await mentor.mouse.click(there.x, there.y);
    await mentor.waitForURL(new RegExp(`/findings/${findingId}$`));
    await mentor.screenshot({ path: artifactPath('markup-mentor.png') });

    await mentor
      .getByLabel('Add a comment')
      .fill('@Mara reflow it and measure across R14 again. Looks like a dry joint from here.');
    await mentor.getByRole('button', { name: 'Send comment' }).click();
    await mentor.getByText('reflow it and measure across R14').waitFor();
    await expectAccessible(mentor, 'a finding with its thread');

    // The demo's own finding on C27 is pinned on the drawn capacitor: clicking the part selects it.
    await mentor.goto(`${ctx.product.origin}${new URL(findingUrl).pathname.replace(/\/findings\/\d+$/, '')}`);
    await mentor.getByTestId('markup-stage').waitFor();
    await expect.poll(() => probe(mentor)).toBeGreaterThan(0);
    const c27 = chassisLandmarks('underside').C27!;
    const onPart = await toClient(mentor, c27.x, c27.y);
    await mentor.mouse.click(onPart.x, onPart.y);
    await mentor.waitForURL(/\/findings\/\d+$/);
    const picked = await mentor.evaluate(
      async () =>
        (
          (await (await fetch(`/api/findings/${location.pathname.split('/').pop()}`)).json()) as {
            componentRef: string;
          }
        ).componentRef,
    );
    expect(picked).toBe('C27');
    await mentor.screenshot({ path: artifactPath('markup-demo-finding.png') });

    const mail = await mailTo(ctx.product.origin, 'mara@cobbold-lane.test', /Gridleak/);
    expect(mail.text).toContain(`/findings/${findingId}`);

    await tech.reload();
    await tech
      .getByRole('group', { name: 'Status' })
      .getByRole('button', { name: /Confirmed/ })
      .click();
    await expect
      .poll(() =>
        tech.evaluate(
          async (id) => ((await (await fetch(`/api/findings/${id}`)).json()) as { status: string }).status,
          findingId,
        ),
      )
      .toBe('confirmed');

    const owner = await newPage(ctx.browser, { width: 390, height: 844 });
    await signInAs(owner, ctx.product.origin, 'imogen@example.test');
    await owner.goto(findingUrl);
    await owner.getByText('not shared with you').waitFor();
    await tech.getByRole('switch', { name: /Share with owner/ }).click();
    await expect
      .poll(() =>
        tech.evaluate(
          async (id) => ((await (await fetch(`/api/findings/${id}`)).json()) as { ownerVisible: boolean }).ownerVisible,
          findingId,
        ),
      )
      .toBe(true);
    await owner.reload();
    await owner.getByText('Dry joint on the V4 tag strip?').first().waitFor();
    // Only once the thread has loaded (its heading shows the count) does an absent reply mean it was withheld.
    await owner.getByRole('heading', { name: 'Thread (0)' }).waitFor();
    expect(await owner.getByText('reflow it and measure across R14').count()).toBe(0);
    await expectAccessible(owner, 'a shared finding on the owner’s phone');
    await owner.screenshot({ path: artifactPath('markup-owner-phone.png'), fullPage: true });
    await tech.screenshot({ path: artifactPath('markup-technician.png') });
    // The technician's and the mentor's pages logged nothing (the owner's met a finding not shared with them: a 404 by design).
    expect(techConsole).toEqual([]);
    expect(mentorConsole).toEqual([]);
  });
});
