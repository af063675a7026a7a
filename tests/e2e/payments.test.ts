import { describe, expect, it } from 'vitest';
import { artifactPath } from '../support/artifacts';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

describe('paying a deposit by card', () => {
  it('when the owner pays an open deposit on the local checkout page, then back on their set it shows processing until confirmed, then paid', async () => {
    // The workshop asks for a deposit (through the API: the deposit form is not part of this journey).
    const bench = await newPage(ctx.browser);
    const benchMessages = watchConsole(bench);
    await signInAs(bench, ctx.product.origin, 'mara@cobbold-lane.test');
    const setId = await bench.evaluate(async () => {
      const sets = (await (await fetch('/api/restorations')).json()) as { id: number; model: string }[];
      const set = sets.find((s) => s.model === 'Meridian 54')!;
      const res = await fetch(`/api/restorations/${set.id}/deposits`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ amount: 4250 }),
      });
      if (res.status !== 201) throw new Error(`deposit: ${res.status}`);
      return set.id;
    });
    expect(benchMessages).toEqual([]);
    await bench.context().close();

    const page = await newPage(ctx.browser, { width: 390, height: 844 });
    const consoleMessages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'imogen@example.test');
    await page.goto(`${ctx.product.origin}/home?set=${setId}`);
    const pay = page.getByRole('button', { name: 'Pay £42.50 by card' });
    await pay.waitFor();
    expect(await page.getByText('Nothing to pay').count()).toBe(0);
    await expectAccessible(page, 'the owner set page with a deposit to pay');

    await pay.click();
    await page.waitForURL(/\/checkout\/cs_test_/);
    await page.getByText('Local test payment page').waitFor();
    await page.getByText('£42.50').waitFor();
    await expectAccessible(page, 'the local test payment page');
    await page.getByRole('button', { name: 'Pay', exact: true }).click();

    await page.waitForURL(/\/home\?set=\d+&payment=processing/);
    // "Processing" may flash by too fast to see; what counts is that it ends as received, from the service's event.
    await page.getByText('Payment received. Thank you.').waitFor({ timeout: 30_000 });
    await page.getByText('Card payment received').waitFor();
    expect(await page.getByRole('button', { name: /^Pay .* by card$/ }).count()).toBe(0);
    await page.screenshot({ path: artifactPath('owner-deposit-paid.png'), fullPage: true });
    await expectAccessible(page, 'the owner set page after paying');
    const invoices = await page.evaluate(
      async (id) =>
        (await (await fetch(`/api/restorations/${id}/invoices`)).json()) as {
          kind: string;
          status: string;
          due: { amount: number };
          paid: { amount: number };
        }[],
      setId,
    );
    // The demo's own deposit (paid by transfer when the set came in) stays as it was; this one is paid by card.
    expect(
      invoices.filter((i) => i.kind === 'deposit' && i.due.amount === 4250).map((i) => [i.status, i.paid.amount]),
    ).toEqual([['paid', 4250]]);
    expect(consoleMessages).toEqual([]);

    // The workshop sees the same line on the Money tab, with a refund offered.
    const desk = await newPage(ctx.browser);
    const deskConsole = watchConsole(desk);
    await signInAs(desk, ctx.product.origin, 'mara@cobbold-lane.test');
    await desk.goto(`${ctx.product.origin}/restorations/${setId}/money`);
    await desk.getByText('Card payment received').waitFor();
    await desk.getByRole('button', { name: 'Refund the card payment of £42.50' }).waitFor();
    await expectAccessible(desk, 'the Money tab with a card payment');
    expect(deskConsole).toEqual([]);
  });
});
