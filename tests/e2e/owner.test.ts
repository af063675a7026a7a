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
  });
});
