import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { artifactPath } from '../support/artifacts';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { mailTo, signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';
import { pdfText } from '../support/pdf-text';

const ctx = useProductAndBrowser();

/** Fills and records one safety test on the Safety tab, as the technician reads the meters. */
async function recordTest(page: Page, earth: string) {
  const form = page.getByRole('form', { name: 'Record a final safety test' });
  await form.getByLabel('Class of the set').selectOption('class-1');
  await form.getByLabel('Earth continuity (Ω)').fill(earth);
  await form.getByLabel('Lead earth-core resistance (Ω)').fill('0.05');
  await form.getByLabel('Insulation resistance (Ω)').fill('50M');
  await form.getByLabel('Fuse fitted (A)').fill('1');
  await form.getByLabel('Fuse recommended (A)').fill('1');
  for (const box of [
    'Mains lead sound, strain relief fitted',
    'Knobs, back cover and insulators refitted',
    'Mains-side capacitors are X/Y safety class',
  ])
    await form.getByLabel(box).check();
  await form.getByRole('button', { name: 'Record the test' }).click();
}

describe('the final safety test, the soak and the hand-back', () => {
  it('when the technician records a failing then a passing test, runs a soak and sends the report, then the owner’s PDF shows the safety table', async () => {
    const page = await newPage(ctx.browser);
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    const sets = (await (await page.request.get(`${ctx.product.origin}/api/restorations?q=Meridian`)).json()) as {
      id: number;
    }[];
    const id = sets[0]!.id;

    await page.goto(`${ctx.product.origin}/restorations/${id}/safety`);
    await page.getByText('Safety test: HT can kill.').waitFor();
    await expect.poll(() => page.getByRole('status').filter({ hasText: 'cannot be marked Returned' }).count()).toBe(1);

    await recordTest(page, '0.6');
    const latest = page.getByRole('region', { name: 'Latest test' });
    await latest.getByText('Not passed').waitFor();
    expect(await latest.getByRole('row', { name: /Protective earth continuity/ }).textContent()).toMatch(
      /Fail.*IET Code of Practice/,
    );

    await recordTest(page, '0.07');
    await latest.getByText('Passed', { exact: true }).waitFor();
    await page.getByRole('status').filter({ hasText: 'The latest test passed' }).waitFor();
    await page.getByText('Earlier tests (1)').waitFor();

    await page.getByRole('button', { name: 'Start a soak run' }).click();
    await page.getByTestId('soak-timer').waitFor();
    await page.reload();
    await page.getByTestId('soak-timer').waitFor(); // the run survives a reload
    const stop = page.getByRole('form', { name: 'Stop the soak run' });
    await stop.getByLabel('Room (°C)').fill('20');
    await stop.getByLabel('Chassis (°C)').fill('44');
    await stop.getByLabel('Mains current (A)').fill('0.3');
    await stop.getByRole('button', { name: 'Stop the run' }).click();
    await page.getByText(/Run 1, .*room 20 °C, chassis 44 °C, mains 300 mA — no fault seen/).waitFor();
    await page.getByRole('img', { name: /Soak runs: run 1/ }).waitFor();
    await page.screenshot({ path: artifactPath('safety-tab.png'), fullPage: true });
    await expectAccessible(page, 'the safety tab');

    await page.goto(`${ctx.product.origin}/restorations/${id}`);
    await page.getByRole('button', { name: 'E-mail it to the owner' }).click();
    const preview = page.getByTestId('report-preview');
    await preview.getByText('Imogen Tarrant <imogen@example.test>').waitFor();
    await preview.getByText(/The set is still at/).waitFor(); // the demo set is before Testing
    expect(await preview.getByText('No final safety test is recorded').count()).toBe(0);
    await page.screenshot({ path: artifactPath('report-preview.png'), fullPage: true });
    await expectAccessible(page, 'the report preview');
    await page.getByRole('button', { name: 'Send anyway' }).click();
    await page.getByText('Sent to imogen@example.test.').waitFor();
    await mailTo(ctx.product.origin, 'imogen@example.test', /Meridian 54: the hand-back report/);
    expect(messages).toEqual([]);

    const owner = await newPage(ctx.browser);
    const ownerMessages = watchConsole(owner);
    await signInAs(owner, ctx.product.origin, 'imogen@example.test');
    const res = await owner.request.get(`${ctx.product.origin}/api/restorations/${id}/report.pdf`);
    expect(res.status()).toBe(200);
    const text = (await pdfText(await res.body())).replace(/\s+/g, ' ');
    expect(text).toContain('Final safety test');
    expect(text).toContain('Result: passed on every line tested.');
    expect(text).toContain(
      'Protective earth continuity, chassis to plug earth pin: 70 mΩ — PASS (limit at most 0.15 Ω (0.1 Ω + lead 0.05 Ω); IET Code of Practice',
    );
    expect(text).toContain(
      'Insulation, live and neutral joined to exposed metal, at 500 V DC: 50 MΩ — PASS (limit at least 1 MΩ at 500 V DC; IET Code of Practice',
    );
    expect(text).toMatch(/Soak test \d+\.\d hours in 1 run/);
    expect(text).toContain('not a certificate of electrical safety');
    expect(ownerMessages).toEqual([]);
  });
});
