import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { prePowerItemWords, prePowerItems } from '../../shared/schemas/bringup';
import { artifactPath } from '../support/artifacts';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

type Step = {
  supply: string;
  lamp?: [watts: string, volts: string];
  applied: string;
  behaviour?: string;
  ht: string;
  notes: string;
  decision: 'Go on' | 'Stop and find the fault';
};

async function logStep(page: Page, n: number, s: Step) {
  const form = page.getByRole('form', { name: 'Log a power-up step' });
  await form.getByRole('heading', { name: `Log step ${n}` }).waitFor();
  await form.getByLabel('Supply').selectOption({ label: s.supply });
  if (s.lamp) {
    await form.getByLabel('Lamp (W)').fill(s.lamp[0]);
    await form.getByLabel('Lamp rated (V)').fill(s.lamp[1]);
  }
  await form.getByLabel('Volts applied').fill(s.applied);
  if (s.behaviour) await form.getByLabel('What the lamp did').selectOption({ label: s.behaviour });
  await form.getByLabel('Expected, row 1').fill('110');
  await form.getByLabel('Tolerance (%), row 1').fill('10');
  await form.getByLabel('Reading, row 1').fill(s.ht);
  await form.getByLabel('Smell, smoke, hum, heater glow').fill(s.notes);
  await form.getByRole('radio', { name: s.decision }).check();
  await form.getByRole('button', { name: `Log step ${n}` }).click();
  // Saved: the form moves on to the next step.
  await form.getByRole('heading', { name: `Log step ${n + 1}` }).waitFor();
}

describe('bring-up', () => {
  it('when a technician signs the pre-power check off and logs a three-step bring-up with one stop-and-fix, then the log, readings and history show it', async () => {
    const page = await newPage(ctx.browser, { width: 1280, height: 1000 });
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    await page.getByRole('link', { name: /KW-3381/ }).click();
    await page.getByRole('link', { name: 'Bring-up' }).click();
    await page.getByRole('heading', { name: 'Pre-power checklist' }).waitFor();
    expect(await page.getByText(/Not signed off/).isVisible()).toBe(true);
    expect(await page.getByRole('form', { name: 'Log a power-up step' }).count()).toBe(0);
    // The cautions defer to local codes and licensed practice.
    expect(await page.getByRole('note', { name: 'Power-up caution' }).innerText()).toMatch(/licensed practice/);
    expect(await page.getByRole('note', { name: 'Power-up caution' }).innerText()).toMatch(/isolation transformer/);

    for (const item of prePowerItems) {
      const label = prePowerItemWords[item].label;
      const row = page.getByRole('group', { name: label });
      if (item === 'rectifier-transformer') {
        await row.getByRole('radio', { name: 'Not applicable' }).check();
        await row
          .getByLabel('Reason it does not apply')
          .fill('AC/DC set: no mains transformer; rectifier checked out of circuit');
      } else await row.getByRole('radio', { name: 'Done' }).check();
      await page.getByRole('button', { name: `Save: ${label.toLowerCase()}` }).click();
      await expect.poll(() => page.getByText(`${label}: mark it done`).count()).toBe(0);
    }
    await page.getByRole('button', { name: 'Sign off the pre-power checklist' }).click();
    await page.getByText(/Signed off by Mara Ellingsworth/).waitFor();

    await logStep(page, 1, {
      supply: 'Series lamp',
      lamp: ['40', '230'],
      applied: '230',
      behaviour: 'Brief flash, then dim',
      ht: '104',
      notes: 'Heaters glowing, no smell',
      decision: 'Go on',
    });
    // The lamp limit from the bench library, inline: 60 W / 230 V = 0.26 A (P/V, worked by hand).
    const form = page.getByRole('form', { name: 'Log a power-up step' });
    await form.getByLabel('Lamp (W)').fill('60');
    await form.getByLabel('Lamp rated (V)').fill('230');
    await form.getByLabel('Volts applied').fill('230');
    await form.getByText(/passes at most 0\.26 A at 230 V/).waitFor();
    await logStep(page, 2, {
      supply: 'Series lamp',
      lamp: ['60', '230'],
      applied: '230',
      behaviour: 'Bright and staying bright',
      ht: '22',
      notes: 'Lamp stayed bright; rectifier warm. Switched off; found the reservoir shorted and replaced it.',
      decision: 'Stop and find the fault',
    });
    await logStep(page, 3, {
      supply: 'Variable transformer',
      applied: '230',
      ht: '112',
      notes: 'Raised slowly to 230 V; HT steady.',
      decision: 'Go on',
    });

    const steps = page
      .getByRole('list', { name: 'Power-up steps' })
      .getByRole('listitem')
      .filter({ hasText: /^Step \d/ });
    expect(await steps.count()).toBe(3);
    expect(await steps.nth(1).innerText()).toMatch(/Stop and find the fault/);
    expect(await steps.nth(1).innerText()).toMatch(/HT: 22.*out/s);
    expect(await steps.nth(2).innerText()).toMatch(/HT: 112.*within/s);
    await page.screenshot({ path: artifactPath('bringup.png'), fullPage: true });
    await expectAccessible(page, 'the bring-up tab');

    // The step readings are ordinary readings with verdicts.
    await page.getByRole('link', { name: 'Readings' }).click();
    const stepRows = page
      .getByRole('table', { name: 'All readings, newest first' })
      .getByRole('row')
      .filter({ hasText: /Power-up step \d/ });
    await expect.poll(() => stepRows.count(), { timeout: 15_000 }).toBe(3);
    expect(await stepRows.filter({ hasText: /Power-up step 2/ }).innerText()).toMatch(/\bout\b/i);
    // The latest HT reading is the voltage chart's point.
    expect(await page.getByRole('img', { name: /Voltage chart, 1 point/ }).count()).toBe(1);

    // The stop is in red in the history.
    await page.getByRole('link', { name: 'History' }).click();
    const stop = page.getByText(
      /Power-up step 2: series lamp 60 W, lamp: bright and staying bright — stop and find the fault/,
    );
    await stop.waitFor();
    expect(await stop.evaluate((el) => el.className)).toMatch(/text-danger/);
    expect(messages).toEqual([]);
  });
});
