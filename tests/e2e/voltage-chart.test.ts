import { describe, expect, it } from 'vitest';
import { artifactPath } from '../support/artifacts';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

// Five points of an invented voltage chart; ±10 % each. Only V5 pin 7 (310 V against 250 V, +24 %) is beyond 1.5 × the band.
const points = [
  ['V1 pin 6', '100', '104'],
  ['V4 pin 9', '90', '92'],
  ['V5 pin 7', '250', '310'],
  ['V5 pin 9', '250', '246'],
  ['V7 pin 3', '270', '265'],
] as const;

describe('voltage chart', () => {
  it('when five points are entered and one is out of tolerance, then the table and the plot flag exactly that one', async () => {
    const page = await newPage(ctx.browser, { width: 1280, height: 1000 });
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    // The set's card on the bench (its serial), not its lines under Recent activity.
    await page.getByRole('link', { name: /HT12-0988/ }).click();
    await page.getByRole('link', { name: 'Readings' }).click();
    await page.getByRole('button', { name: 'Enter a voltage chart' }).waitFor();
    await expectAccessible(page, 'the readings tab');
    await page.getByRole('button', { name: 'Enter a voltage chart' }).click();
    const form = page.getByRole('form', { name: 'Enter a voltage chart' });
    await form.getByLabel('Location, row 1').waitFor();
    await expectAccessible(page, 'the voltage chart form');
    for (let i = 0; i < points.length; i++) {
      if (i > 0 && (await form.getByLabel(`Location, row ${i + 1}`).count()) === 0)
        await form.getByRole('button', { name: 'Add row' }).click();
      const [location, expected, reading] = points[i]!;
      await form.getByLabel(`Location, row ${i + 1}`).fill(location);
      await form.getByLabel(`Expected, row ${i + 1}`).fill(expected);
      await form.getByLabel(`Tolerance (%), row ${i + 1}`).fill('10');
      await form.getByLabel(`Reading, row ${i + 1}`).fill(reading);
    }
    await form.getByRole('button', { name: 'Save all (5)' }).click();

    const table = page.getByRole('table', { name: 'Voltage chart' });
    await expect.poll(() => table.getByRole('row').filter({ hasText: /pin/ }).count(), { timeout: 15_000 }).toBe(5);
    const outRows = table.getByRole('row').filter({ hasText: /\bout\b/i });
    expect(await outRows.count()).toBe(1);
    expect(await outRows.first().innerText()).toMatch(/V5 pin 7|pin 7/);
    const plot = page.getByRole('img', { name: /Voltage chart, 5 points/ });
    const summary = (await plot.getAttribute('aria-label')) ?? '';
    expect(summary).toMatch(/1 out/);
    expect(summary).toMatch(/Out of tolerance: [^.;]*pin 7/);
    expect(summary).not.toMatch(/Out of tolerance:[^.]*(pin 6|pin 9|pin 3)/);
    await expectAccessible(page, 'the voltage chart and its plot');
    await page.screenshot({ path: artifactPath('voltage-chart.png'), fullPage: true });
    expect(messages).toEqual([]);
  });
});
