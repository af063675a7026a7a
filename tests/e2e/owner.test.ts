import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { artifactPath } from '../support/artifacts';
import { newPage } from '../support/browser';
import { signInAs } from '../support/journey';
import { pdfText } from '../support/pdf-text';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

describe('the owner at home, on a phone', () => {
  it('when the owner opens their set, then they compare before and after with the slider and download the report', async () => {
    const page = await newPage(ctx.browser, { width: 390, height: 844 });
    await signInAs(page, ctx.product.origin, 'philippa@example.test');
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
    expect(text).toContain('Charred cathode resistor');
    // The cracked-lead finding and the internal thread are not shared with the owner.
    expect(text).not.toContain('Cracked rubber HT lead');
    expect(text).not.toContain('quote');
  });

  it('when the owner scrolls their home on a phone, then no photo is wider than the screen needs and all images stay under 1 MB', async () => {
    const page = await newPage(ctx.browser, { width: 390, height: 844 });
    let imageBytes = 0;
    page.on('response', (res) => {
      if (res.request().resourceType() === 'image') void res.body().then((b) => (imageBytes += b.length), () => {});
    });
    await signInAs(page, ctx.product.origin, 'philippa@example.test');
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
        return { currentSrc: el.currentSrc, rendered: el.getBoundingClientRect().width * window.devicePixelRatio, complete: el.complete, candidates };
      }));
    const loaded = photos.filter((p) => p.currentSrc);
    expect(loaded.length).toBeGreaterThan(0);
    for (const p of loaded) {
      const chosen = p.candidates.find((c) => c.url === p.currentSrc);
      expect(chosen, `${p.currentSrc} is one of its srcset's candidates`).toBeDefined();
      // The smallest candidate that covers the rendered width is the widest the browser needed.
      const needed = p.candidates.filter((c) => c.width >= p.rendered).sort((a, b) => a.width - b.width)[0] ?? p.candidates.at(-1)!;
      expect(chosen!.width).toBeLessThanOrEqual(needed.width);
    }
    await expect.poll(() => imageBytes).toBeGreaterThan(0);
    expect(imageBytes).toBeLessThanOrEqual(1024 * 1024);
    console.log(`owner home on a phone: ${loaded.length} photos, ${(imageBytes / 1024).toFixed(0)} KB of images`);
  });
});
