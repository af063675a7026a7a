import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { artifactPath } from '../support/artifacts';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { signInAs } from '../support/journey';
import { pdfText } from '../support/pdf-text';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

describe('the owner at home, on a phone', () => {
  it('when the owner opens their set, then they compare before and after with the slider and download the report', async () => {
    const page = await newPage(ctx.browser, { width: 390, height: 844 });
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'imogen@example.test');
    await page.goto(ctx.product.origin);
    await page.waitForURL(/\/home/);
    await page.getByText('Meridian 54').first().waitFor();

    const slider = page.getByRole('slider', { name: 'Before and after comparison' }).first();
    await slider.scrollIntoViewIfNeeded();
    const start = Number(await slider.getAttribute('aria-valuenow'));
    await slider.focus();
    await page.keyboard.press('ArrowRight');
    await page.keyboard.press('ArrowRight');
    await expect.poll(async () => Number(await slider.getAttribute('aria-valuenow'))).toBeGreaterThan(start);
    await page.screenshot({ path: artifactPath('owner-home-phone.png'), fullPage: true });
    await expectAccessible(page, 'the owner home on a phone');

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Download the hand-back report (PDF)' }).first().click(),
    ]);
    const file = artifactPath('hand-back-report.pdf');
    await download.saveAs(file);
    const pdf = readFileSync(file);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    const text = (await pdfText(pdf)).replace(/\s+/g, ' ');
    expect(text).toContain('Ostrander & Vale Meridian 54');
    expect(text).toContain('Leaky coupling capacitor to the output valve');
    expect(text).toContain('Volume control crackles');
    // The perished-wiring finding and the internal thread are not shared with the owner.
    expect(text).not.toContain('Perished rubber wiring');
    expect(text).not.toContain('Positive grid with a red anode');
    expect(messages).toEqual([]);
  });

  it('when the owner opens a repaired fault on the photo and the parts ledger, then they read owner pages: no tools, Fit, owner cautions, no planned parts, shopping list or CSV', async () => {
    const page = await newPage(ctx.browser, { width: 1280, height: 900 });
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'imogen@example.test');
    const target = await page.evaluate(async () => {
      const sets = (await (await fetch('/api/restorations')).json()) as { id: number; model: string; role: string }[];
      const set = sets.find((s) => s.model === 'Meridian 54' && s.role === 'owner')!;
      const list = (await (await fetch(`/api/restorations/${set.id}/findings`)).json()) as {
        id: number;
        photoId: number;
        title: string;
      }[];
      const f = list.find((x) => x.title === 'Leaky coupling capacitor to the output valve')!;
      return { restorationId: set.id, photoId: f.photoId, findingId: f.id };
    });

    await page.goto(
      `${ctx.product.origin}/restorations/${target.restorationId}/photos/${target.photoId}/findings/${target.findingId}`,
    );
    await page.getByRole('heading', { name: 'Leaky coupling capacitor to the output valve' }).waitFor();
    // The thread has loaded (its shared reply is there) before the internal replies are looked for.
    await page.getByText(/The capacitor that passes the signal to the output valve was leaking/).waitFor();
    expect(await page.getByText(/Positive grid with a red anode/).count()).toBe(0);
    expect(await page.getByText(/C27 out of circuit/).count()).toBe(0);

    // A read-only photo: zoom and legend, no markup tools, Undo or Keys.
    await page.getByTestId('markup-stage').waitFor();
    for (const name of ['Select', 'Undo', /Keys/]) expect(await page.getByRole('button', { name }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Fit' }).count()).toBe(1);
    // At Fit the whole photo is on the stage and fills it along one side (the meaning of "fit to window").
    const probe = await page.evaluate(() => {
      type Size = { width: number; height: number };
      const m = (window as unknown as { __gridleakMarkup: { view: { scale: number }; image: Size; stage: Size } })
        .__gridleakMarkup;
      return { scale: m.view.scale, image: m.image, stage: m.stage };
    });
    const shown = { width: probe.image.width * probe.scale, height: probe.image.height * probe.scale };
    expect(shown.width).toBeLessThanOrEqual(probe.stage.width);
    expect(shown.height).toBeLessThanOrEqual(probe.stage.height);
    expect(Math.max(shown.width / probe.stage.width, shown.height / probe.stage.height)).toBeGreaterThan(0.85);

    // The finding's caution speaks to the owner, not the bench routine.
    await page.getByText('let only a competent person open it').first().waitFor();
    expect(await page.getByText(/switch off, unplug|discharge the filter/).count()).toBe(0);

    await page.goto(`${ctx.product.origin}/restorations/${target.restorationId}/parts`);
    await page.getByRole('row', { name: 'Part C27' }).waitFor();
    // The planned speaker leads wait on the owner's word: planned lines are the workshop's business.
    expect(await page.getByRole('row', { name: 'Part Speaker leads' }).count()).toBe(0);
    expect(await page.getByRole('columnheader', { name: 'Cost' }).count()).toBe(0);
    expect(await page.getByRole('link', { name: 'Export CSV' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Shopping list' }).count()).toBe(0);
    await page.screenshot({ path: artifactPath('owner-parts.png'), fullPage: true });
    await expectAccessible(page, 'the owner parts ledger');
    expect(messages).toEqual([]);
  });

  it('when the owner scrolls their home on a phone, then no photo is wider than the screen needs and all images stay under 1 MB', async () => {
    const page = await newPage(ctx.browser, { width: 390, height: 844 });
    let imageBytes = 0;
    page.on('response', (res) => {
      if (res.request().resourceType() === 'image')
        void res.body().then(
          (b) => (imageBytes += b.length),
          () => {},
        );
    });
    await signInAs(page, ctx.product.origin, 'imogen@example.test');
    imageBytes = 0; // count the home page only
    await page.goto(ctx.product.origin);
    await page.waitForURL(/\/home/);
    await page.getByText('Meridian 54').first().waitFor();
    // Scroll to the end so lazy images load too, then let them settle.
    for (let y = 0; y < 20; y++) {
      await page.mouse.wheel(0, 800);
      await page.waitForTimeout(150);
    }
    await page.waitForLoadState('networkidle');
    const photos = await page.evaluate(() =>
      [...document.querySelectorAll('img[srcset]')].map((img) => {
        const el = img as HTMLImageElement;
        const candidates = el.srcset.split(',').map((c) => {
          const [url, w] = c.trim().split(/\s+/);
          return { url: url!, width: Number.parseInt(w!, 10) };
        });
        return {
          currentSrc: el.currentSrc,
          rendered: el.getBoundingClientRect().width * window.devicePixelRatio,
          complete: el.complete,
          candidates,
        };
      }),
    );
    const loaded = photos.filter((p) => p.currentSrc);
    expect(loaded.length).toBeGreaterThan(0);
    for (const p of loaded) {
      const chosen = p.candidates.find((c) => c.url === p.currentSrc);
      expect(chosen, `${p.currentSrc} is one of its srcset's candidates`).toBeDefined();
      // The smallest candidate that covers the rendered width is the widest the browser needed.
      const needed =
        p.candidates.filter((c) => c.width >= p.rendered).sort((a, b) => a.width - b.width)[0] ?? p.candidates.at(-1)!;
      expect(chosen!.width).toBeLessThanOrEqual(needed.width);
    }
    await expect.poll(() => imageBytes).toBeGreaterThan(0);
    expect(imageBytes).toBeLessThanOrEqual(1024 * 1024);
    console.log(`owner home on a phone: ${loaded.length} photos, ${(imageBytes / 1024).toFixed(0)} KB of images`);
  });
});
