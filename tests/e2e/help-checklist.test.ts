import { describe, expect, it } from 'vitest';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

// The causes, their order and their tests come from shared/bench/symptoms (the trade notes, TRADE.md §5); the
// verdicts are the bench library's (decision 24); the sets and people are the demo workshop's.
async function openHelpTab(page: Awaited<ReturnType<typeof newPage>>, model: string) {
  const id = await page.evaluate(
    async (m) =>
      ((await (await fetch('/api/restorations')).json()) as { id: number; model: string }[]).find((s) => s.model === m)!
        .id,
    model,
  );
  await page.goto(`${ctx.product.origin}/restorations/${id}/help`);
  await page.getByRole('heading', { name: 'Symptom checklist' }).waitFor();
  return id;
}

describe('working through a symptom and asking for readings', () => {
  it('when the technician ticks causes off with a reading, then the help request carries the checklist and its results', async () => {
    const page = await newPage(ctx.browser);
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    await openHelpTab(page, 'Tonecraft 12');
    await page.getByLabel('Symptom', { exact: true }).selectOption({ label: 'Loud hum' });
    const first = page.getByRole('listitem', { name: 'Reservoir or smoothing electrolytics lost their capacitance' });
    await first.getByText(/Measured with the set switched on/).waitFor();
    await expectAccessible(page, 'symptom checklist');

    await first.getByLabel('Ruled out').check();
    await first.getByRole('button', { name: 'Save result' }).click();
    await first.getByRole('status').getByText('Ruled out').waitFor();

    const earth = page.getByRole('listitem', { name: 'Poor earth at a rusted valve-socket rivet or tag' });
    await earth.getByLabel('Confirmed').check();
    await earth.getByLabel('Where measured').fill('V2 socket earth tag');
    await earth.getByLabel('Expected (chart)').fill('0.5');
    await earth.getByLabel('Reading').fill('4.7');
    await earth.getByRole('button', { name: 'Save result' }).click();
    await earth.getByRole('status').getByText('V2 socket earth tag read 4.7').waitFor();

    await page.getByLabel('The symptom, in your words').fill('Loud hum at any volume; one earth tag reads high.');
    await page.getByRole('button', { name: 'Start a help request' }).click();
    await page.getByRole('heading', { name: 'Checklist: Loud hum' }).waitFor();
    const section = page.getByRole('heading', { name: 'Checklist: Loud hum' }).locator('xpath=../..');
    await section.getByText(/Poor earth .* Confirmed/).waitFor();
    await section.getByText(/Reservoir .* Ruled out/).waitFor();
    expect(await section.getByText('V2 socket earth tag read').count()).toBe(1);
    await expectAccessible(page, 'help request with checklist');

    await page.getByRole('button', { name: 'Remove the checklist for Loud hum from the request' }).click();
    await expect.poll(async () => page.getByRole('heading', { name: 'Checklist: Loud hum' }).count()).toBe(0);
    expect(messages).toEqual([]);
  });

  it("when a mentor asks for a reading, then it waits on the technician's bench, is answered with a reading, and the mentor sees the answer", async () => {
    const mentor = await newPage(ctx.browser);
    const mentorMessages = watchConsole(mentor);
    await signInAs(mentor, ctx.product.origin, 'teodor@cobbold-lane.test');
    await openHelpTab(mentor, 'Wren AC/DC');
    await mentor.getByLabel('What, and where').fill('Measure V3 pin 6 with no signal');
    await mentor.getByRole('button', { name: 'Ask the technician' }).click();
    const asked = mentor.getByRole('listitem').filter({ hasText: 'Measure V3 pin 6 with no signal' });
    await asked.getByText('Waiting for the technician').waitFor();
    await expectAccessible(mentor, 'requests for readings, mentor');

    const tech = await newPage(ctx.browser);
    const techMessages = watchConsole(tech);
    await signInAs(tech, ctx.product.origin, 'mara@cobbold-lane.test');
    await tech.getByRole('heading', { name: 'Readings asked for' }).waitFor();
    await expectAccessible(tech, 'bench with a reading asked for');
    await tech
      .getByRole('region', { name: 'Readings asked for' })
      .getByRole('link', { name: /Measure V3 pin 6 with no signal/ })
      .click();
    const task = tech.getByRole('listitem').filter({ hasText: 'Measure V3 pin 6 with no signal' });
    await task.getByLabel('Where measured').fill('V3 pin 6');
    await task.getByLabel('Expected (chart)').fill('100');
    await task.getByLabel('Reading').fill('95');
    await task.getByLabel('Note').fill('No signal, volume at zero.');
    await task.getByRole('button', { name: 'Send the answer to: Measure V3 pin 6 with no signal' }).click();
    await task.getByText(/Answered by Mara Ellingsworth/).waitFor();

    await mentor.reload();
    const answered = mentor.getByRole('status', { name: 'Answer to: Measure V3 pin 6 with no signal' });
    await answered.getByText(/Answered by Mara Ellingsworth/).waitFor();
    await answered.getByText('No signal, volume at zero.').waitFor();
    expect(await answered.getByText('95').count()).toBeGreaterThan(0);
    await mentor.getByRole('button', { name: /^Notifications, \d+ unread/ }).click();
    await mentor
      .getByRole('region', { name: 'Notifications' })
      .getByText(/Mara Ellingsworth answered .*Measure V3 pin 6/)
      .waitFor();
    expect(mentorMessages).toEqual([]);
    expect(techMessages).toEqual([]);
  });
});
