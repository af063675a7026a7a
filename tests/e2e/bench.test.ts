import { describe, expect, it } from 'vitest';
import { artifactPath } from '../support/artifacts';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { twoToneJpeg } from '../factories/images';
import { mailTo, signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

describe('the bench', () => {
  it('when a technician takes in a set through the form, then it appears on the bench at intake', async () => {
    const page = await newPage(ctx.browser);
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    await page.goto(ctx.product.origin);
    await expect.poll(() => page.getByRole('heading', { name: 'The bench' }).isVisible()).toBe(true);
    // The demo restorations are on the bench, grouped by stage.
    await page.getByRole('link', { name: /OV-54-20417/ }).waitFor();
    // What happened lately across the workshop's sets, from the demo's history.
    await page.getByRole('heading', { name: 'Recent activity' }).waitFor();
    expect(await page.getByRole('region', { name: 'Recent activity' }).getByRole('link').count()).toBeGreaterThan(0);
    expect(await page.getByRole('heading', { name: /Repair/ }).count()).toBe(1);
    await expectAccessible(page, 'the bench');

    await page.getByRole('link', { name: '+ Take in a set' }).click();
    await page.getByRole('heading', { name: 'Take in a set' }).waitFor();
    await expectAccessible(page, 'the intake form');
    await page.getByLabel('Maker').fill('Farrowby & Daughters');
    await page.getByLabel('Model').fill('Nightjar 6');
    await page.getByLabel('Year').fill('1958');
    await page.getByLabel('Serial number').fill('FD-6-1142');
    await page.getByLabel(/Symptoms/).fill('Crackles, then fades after ten minutes.');
    await page.getByLabel("Owner's name").fill('Wilhelmina Crane');
    await page.getByLabel("Owner's e-mail").fill('wilhelmina.crane@example.test');
    await page.getByLabel(/Invite them as the owner/).check();
    await page.getByRole('button', { name: 'Put it on the bench' }).click();

    // After saving, the new set opens, and its owner has an invitation in the mail.
    await page.waitForURL(/\/restorations\/\d+$/);
    await page
      .getByRole('heading', { name: /Farrowby & Daughters Nightjar 6/ })
      .first()
      .waitFor();
    expect((await mailTo(ctx.product.origin, 'wilhelmina.crane@example.test')).text).toContain('/invitations/');

    await page.goto(ctx.product.origin);
    const card = page.getByRole('link', { name: /Farrowby & Daughters Nightjar 6/ });
    await card.waitFor();
    const intake = page.locator('section', { has: page.getByRole('heading', { name: /Intake/ }) });
    expect(await intake.getByText('Nightjar 6').isVisible()).toBe(true);
    await page.screenshot({ path: artifactPath('bench.png'), fullPage: true });

    await page.getByLabel('Search by make, model or serial').fill('FD-6');
    await expect.poll(() => page.getByRole('link', { name: /OV-54-20417/ }).count()).toBe(0);
    await expect.poll(() => card.isVisible()).toBe(true);
    expect(messages).toEqual([]);
  });

  it('when the form is sent without a maker, then the field says what is missing and nothing is created', async () => {
    const page = await newPage(ctx.browser, { width: 390, height: 844 });
    await page.goto(`${ctx.product.origin}/restorations/new`);
    // Signed out, the form sends the visitor to sign-in and brings them back.
    await page.getByRole('heading', { name: 'Sign in to Gridleak' }).waitFor();
    await expectAccessible(page, 'sign-in on a phone');
    await page.screenshot({ path: artifactPath('sign-in-phone.png'), fullPage: true });
    await page.getByRole('button', { name: /Mara Ellingsworth/ }).click();
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByRole('heading', { name: 'Take in a set' }).waitFor();
    await page.getByLabel('Model').fill('Orphan');
    await page.getByRole('button', { name: 'Put it on the bench' }).click();
    await page.getByText('Enter the maker, as printed on the set').waitFor();
    expect(page.url()).toContain('/restorations/new');
    await expectAccessible(page, 'the intake form showing an error');
    // Nothing reached the server: no restoration named "Orphan" exists for this technician.
    const found = await page.evaluate(
      async () => (await (await fetch('/api/restorations?q=Orphan')).json()) as unknown[],
    );
    expect(found).toEqual([]);
    await page.screenshot({ path: artifactPath('intake-form-phone.png'), fullPage: true });
  });

  it('when the technician adds photos from the picker, then each shows its progress, lands in the gallery, and a text file is refused', async () => {
    const page = await newPage(ctx.browser);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    await page.getByRole('link', { name: /HT12-0988/ }).click();
    await page.getByRole('link', { name: 'Photos' }).click();
    await page.getByLabel('View').first().selectOption('rear');
    await expectAccessible(page, 'the photo library');
    // Each upload is held at the server's door for a moment, so its progress bar can be seen.
    await page.route('**/api/restorations/*/photos', async (route) => {
      if (route.request().method() === 'POST') await new Promise((r) => setTimeout(r, 1500));
      await route.continue();
    });
    const jpeg = await twoToneJpeg(1600, 1200);
    await page.locator('input[type=file][multiple]').setInputFiles([
      { name: 'rear-1.jpg', mimeType: 'image/jpeg', buffer: jpeg },
      { name: 'notes.jpg', mimeType: 'image/jpeg', buffer: Buffer.from('not a photo at all') },
    ]);
    for (const name of ['rear-1.jpg', 'notes.jpg'])
      await page.getByRole('progressbar', { name: `Upload of ${name}` }).waitFor();
    await page.getByText(/not a photo Gridleak can read/).waitFor();
    await page
      .getByRole('button', { name: /Rear, before/ })
      .first()
      .waitFor({ timeout: 30_000 });
    expect(await page.getByRole('button', { name: /Rear, before/ }).count()).toBe(1);
    await page.screenshot({ path: artifactPath('photos-upload.png'), fullPage: true });
  });
});
