import { and, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { formatMoney } from '../../shared/money/currency';
import { invoices } from '../../server/db/schema';
import { connectDatabase } from '../../server/db/client';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { mailTo, signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

describe('money at the bench and at hand-back', () => {
  it('when the technician logs time, takes a deposit and invoices at hand-back, then the owner reads the invoice with the deposit deducted', async () => {
    const page = await newPage(ctx.browser);
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');

    // The workshop's settings: pounds, £40 an hour, no tax, invoice numbers printed with CL-.
    await page.goto(`${ctx.product.origin}/workshop/settings`);
    await page.getByRole('heading', { name: 'Workshop settings' }).waitFor();
    await page.getByLabel('Currency').waitFor();
    await expectAccessible(page, 'the workshop settings');
    await page.getByLabel('Labour rate per hour').fill('40');
    await page.getByLabel('Invoice number prefix').fill('CL-');
    if (await page.getByLabel('Charge tax on estimates and invoices').isChecked())
      await page.getByLabel('Charge tax on estimates and invoices').uncheck();
    await page.getByRole('button', { name: 'Save the settings' }).click();
    await page.getByRole('status').filter({ hasText: 'Saved.' }).waitFor();

    const setId = await page.evaluate(async () => {
      const sets = (await (await fetch('/api/restorations')).json()) as { id: number; model: string }[];
      return sets.find((s) => s.model === 'Meridian 54')!.id;
    });
    await page.goto(`${ctx.product.origin}/restorations/${setId}/money`);
    await page.getByRole('heading', { name: 'Labour' }).waitFor();

    // A timer started at the bench survives a reload: its start is on the server.
    await page.getByRole('button', { name: 'Start the timer' }).click();
    await page.getByRole('timer').waitFor();
    await page.reload();
    await page.getByRole('timer').waitFor();
    await page.getByRole('button', { name: 'Stop the timer' }).click();
    await page.getByRole('button', { name: 'Start the timer' }).waitFor();
    // Typed hours for the recap done yesterday evening.
    const typed = page.getByRole('form', { name: 'Add typed hours' });
    await typed.getByRole('textbox', { name: 'Hours' }).fill('2.5');
    await typed.getByRole('textbox', { name: 'Note' }).fill('Recapped the audio stage');
    await typed.getByRole('button', { name: 'Add the hours' }).click();
    await page.getByRole('cell', { name: 'Recapped the audio stage' }).waitFor();
    await expectAccessible(page, 'the Money tab with the labour log');

    // A deposit of £40.00, paid by the owner (recorded here straight in the database: payments are their own feature).
    await page.getByRole('button', { name: 'Request a deposit' }).click();
    const deposit = page.getByRole('form', { name: 'Request a deposit' });
    await deposit.getByRole('radio', { name: 'A fixed amount' }).check();
    await deposit.getByRole('textbox', { name: 'Amount (GBP)' }).fill('40');
    await deposit.getByRole('button', { name: 'Issue the deposit request' }).click();
    await page.getByRole('heading', { name: /^Deposit request CL-\d+$/ }).waitFor();
    await mailTo(ctx.product.origin, 'imogen@example.test', /Deposit request CL-/);
    const db = connectDatabase(ctx.product.databaseUrl);
    try {
      await db.db
        .update(invoices)
        .set({ paid: invoices.due })
        .where(and(eq(invoices.restorationId, setId), eq(invoices.kind, 'deposit')));
    } finally {
      await db.pool.end();
    }
    await page.reload();
    // Every deposit paid on the set: this £40.00 and the demo's own deposit, paid by transfer when the set came in.
    const depositsPaid = await page.evaluate(
      async (id) =>
        (
          (await (await fetch(`/api/restorations/${id}/invoices`)).json()) as {
            kind: string;
            paid: { amount: number };
          }[]
        )
          .filter((i) => i.kind === 'deposit')
          .reduce((a, i) => a + i.paid.amount, 0),
      setId,
    );
    expect(depositsPaid).toBeGreaterThanOrEqual(4000);
    const less = formatMoney({ amount: -depositsPaid, currency: 'GBP' }, 'en-GB');

    // At hand-back: the final invoice from the log (at least 2.5 h at £40) less the deposits paid.
    await page.getByRole('button', { name: 'Build the final invoice' }).click();
    const draft = page.getByRole('region', { name: 'Final invoice, not yet issued' });
    await draft.getByRole('row', { name: /Less deposits paid/ }).waitFor();
    expect(await draft.getByRole('row', { name: /Less deposits paid/ }).textContent()).toContain(less);
    await expectAccessible(page, 'the final invoice before issuing');
    await draft.getByRole('button', { name: 'Issue the final invoice' }).click();
    await page.getByRole('button', { name: 'Issue and e-mail it' }).click();
    const heading = page.getByRole('heading', { name: /^Invoice CL-\d+$/ });
    await heading.waitFor();
    const reference = (await heading.textContent())!.replace('Invoice ', '');
    await mailTo(ctx.product.origin, 'imogen@example.test', new RegExp(`Invoice ${reference}`));
    expect(messages).toEqual([]);

    // The owner reads it on their own page, the deposit deducted, with its PDF.
    const owner = await newPage(ctx.browser);
    const ownerMessages = watchConsole(owner);
    await signInAs(owner, ctx.product.origin, 'imogen@example.test');
    await owner.goto(`${ctx.product.origin}/restorations/${setId}/money`);
    const card = owner.getByRole('region', { name: `Invoice ${reference}` });
    await card.waitFor();
    expect(await card.getByRole('row', { name: /Less deposits paid/ }).textContent()).toContain(less);
    await card.getByRole('link', { name: `PDF of ${reference}` }).waitFor();
    expect(await owner.getByRole('button', { name: /Void|Build the final invoice|Request a deposit/ }).count()).toBe(0);
    await expectAccessible(owner, 'the owner’s invoices');
    expect(ownerMessages).toEqual([]);
  });
});
