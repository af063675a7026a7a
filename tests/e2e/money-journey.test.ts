import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { formatMoney } from '../../shared/money/currency';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

type InvoiceRow = {
  id: number;
  kind: string;
  status: string;
  reference: string;
  due: { amount: number; currency: string };
  paid: { amount: number };
  deducted: { amount: number };
};
const invoicesOf = (page: Page, setId: number) =>
  page.evaluate(async (id) => (await (await fetch(`/api/restorations/${id}/invoices`)).json()) as InvoiceRow[], setId);

/** On the owner's set page: press Pay, then Pay on the local checkout page, and wait until the event has marked it paid. */
async function payByCard(page: Page, setId: number, amountText: string) {
  await page.goto(`${ctx.product.origin}/home?set=${setId}`);
  const pay = page.getByRole('button', { name: `Pay ${amountText} by card` });
  await pay.waitFor();
  await expectAccessible(page, `the owner set page with ${amountText} to pay`);
  await pay.click();
  await page.waitForURL(/\/checkout\/cs_test_/);
  await page.getByText(amountText).first().waitFor();
  await page.getByRole('button', { name: 'Pay', exact: true }).click();
  await page.waitForURL(/\/home\?set=\d+&payment=processing/);
  await page.getByText('Payment received. Thank you.').waitFor({ timeout: 30_000 });
  expect(await page.getByRole('button', { name: /^Pay .* by card$/ }).count()).toBe(0);
}

describe('the money journey, from estimate to the last payment', () => {
  it('when the technician estimates, the owner approves and pays the deposit, and the final invoice deducts it, then the owner pays the rest and both see it paid', async () => {
    const bench = await newPage(ctx.browser);
    const benchConsole = watchConsole(bench);
    await signInAs(bench, ctx.product.origin, 'mara@cobbold-lane.test');
    const setId = await bench.evaluate(
      async () =>
        ((await (await fetch('/api/restorations')).json()) as { id: number; model: string }[]).find(
          (s) => s.model === 'Meridian 54',
        )!.id,
    );

    // The technician revises the estimate after checking the power supply and sends it.
    await bench.goto(`${ctx.product.origin}/restorations/${setId}/money`);
    await bench.getByRole('button', { name: 'Revise the estimate' }).click();
    const form = bench.getByRole('form', { name: 'New estimate' });
    await form.getByRole('textbox', { name: 'Line 1 description' }).fill('Recap the audio and power stages');
    await form.getByRole('textbox', { name: 'Line 1 low' }).fill('3');
    await form.getByRole('textbox', { name: 'Line 1 high' }).fill('5');
    await form.getByRole('textbox', { name: 'Line 2 description' }).fill('Capacitors and resistors');
    await form.getByRole('textbox', { name: 'Line 2 low' }).fill('20');
    await form.getByRole('textbox', { name: 'Line 2 high' }).fill('35');
    await expectAccessible(bench, 'the Money tab writing an estimate');
    await form.getByRole('button', { name: 'Send to the owner' }).click();
    await bench.getByText("waiting for the owner's answer", { exact: false }).waitFor();

    // The owner approves it on their page and pays a deposit the technician asks for.
    const owner = await newPage(ctx.browser, { width: 390, height: 844 });
    const ownerConsole = watchConsole(owner);
    await signInAs(owner, ctx.product.origin, 'imogen@example.test');
    await owner.goto(`${ctx.product.origin}/restorations/${setId}/money`);
    await owner.getByRole('button', { name: 'Approve version 2' }).waitFor();
    await expectAccessible(owner, 'the owner reading the estimate');
    await owner.getByLabel('Your name').fill('Imogen Tarrant');
    await owner.getByRole('button', { name: 'Approve version 2' }).click();
    await owner
      .getByText(/Approved by Imogen Tarrant/)
      .first()
      .waitFor();

    await bench.reload();
    await bench.getByRole('button', { name: 'Request a deposit' }).click();
    const deposit = bench.getByRole('form', { name: 'Request a deposit' });
    await deposit.getByRole('radio', { name: 'A fixed amount' }).check();
    await deposit.getByRole('textbox', { name: 'Amount (GBP)' }).fill('30');
    // The demo already has a deposit request: wait for this one's card, not any, before the owner looks.
    const depositCards = bench.getByRole('heading', { name: /^Deposit request / });
    await depositCards.first().waitFor();
    const before = await depositCards.count();
    await deposit.getByRole('button', { name: 'Issue the deposit request' }).click();
    await expect.poll(() => depositCards.count(), { timeout: 30_000 }).toBe(before + 1);

    await payByCard(owner, setId, '£30.00');
    const afterDeposit = await invoicesOf(owner, setId);
    const cardDeposit = afterDeposit.find((i) => i.kind === 'deposit' && i.due.amount === 3000)!;
    expect([cardDeposit.status, cardDeposit.paid.amount]).toEqual(['paid', 3000]); // marked paid by the webhook, not the redirect
    const depositsPaid = afterDeposit.filter((i) => i.kind === 'deposit').reduce((a, i) => a + i.paid.amount, 0);

    // The hours at the bench, typed in; then at hand-back the technician builds and issues the final invoice:
    // every deposit paid is deducted.
    await bench.reload();
    const typed = bench.getByRole('form', { name: 'Add typed hours' });
    await typed.getByRole('textbox', { name: 'Hours' }).fill('8');
    await typed.getByRole('textbox', { name: 'Note' }).fill('Recapped the audio and power stages');
    await typed.getByRole('button', { name: 'Add the hours' }).click();
    await bench.getByRole('cell', { name: 'Recapped the audio and power stages' }).waitFor();
    await bench.getByRole('button', { name: 'Build the final invoice' }).click();
    const draft = bench.getByRole('region', { name: 'Final invoice, not yet issued' });
    const less = draft.getByRole('row', { name: /Less deposits paid/ });
    await less.waitFor();
    expect(await less.textContent()).toContain(formatMoney({ amount: -depositsPaid, currency: 'GBP' }, 'en-GB'));
    await expectAccessible(bench, 'the final invoice before issuing');
    await draft.getByRole('button', { name: 'Issue the final invoice' }).click();
    await bench.getByRole('button', { name: 'Issue and e-mail it' }).click();
    await bench.getByRole('heading', { name: /^Invoice / }).waitFor();
    const final = (await invoicesOf(bench, setId)).find((i) => i.kind === 'final')!;
    expect(final.deducted.amount).toBe(depositsPaid);
    expect(final.status).toBe('open');

    // The owner pays the rest through the checkout.
    const rest = formatMoney(final.due, 'en-US');
    await payByCard(owner, setId, rest);
    await expectAccessible(owner, 'the owner set page with everything paid');
    const settled = (await invoicesOf(owner, setId)).find((i) => i.id === final.id)!;
    expect([settled.status, settled.paid.amount]).toEqual(['paid', final.due.amount]);

    // Both see it paid: the owner on the invoice card, the technician on the Money tab.
    await owner.goto(`${ctx.product.origin}/restorations/${setId}/money`);
    const ownerCard = owner.getByRole('region', { name: `Invoice ${final.reference}` });
    await ownerCard.getByText('Paid', { exact: true }).waitFor();
    await bench.reload();
    const benchCard = bench.getByRole('region', { name: `Invoice ${final.reference}` });
    await benchCard.getByText('Paid', { exact: true }).waitFor();
    expect(await bench.getByText('Card payment received').count()).toBe(2);
    await expectAccessible(bench, 'the Money tab with everything paid');
    expect(benchConsole).toEqual([]);
    expect(ownerConsole).toEqual([]);
  });
});
