import { describe, expect, it } from 'vitest';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { pdfPages } from '../support/pdf-text';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

// Expectations are the product's rule that a help link shows only what is shared with the owner
// (decision 25) and the demo scenario's own data; no outside source.
describe('asking for help outside the workshop', () => {
  it('when the technician shares a help request, then a stranger sees the chart and the pin at its spot, no internal thread, and their reply waits for approval', async () => {
    const page = await newPage(ctx.browser);
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    const target = await page.evaluate(async () => {
      const sets = (await (await fetch('/api/restorations')).json()) as { id: number; model: string }[];
      const set = sets.find((s) => s.model === 'Meridian 54')!;
      const list = (await (await fetch(`/api/restorations/${set.id}/findings`)).json()) as {
        id: number;
        title: string;
        points: { x: number; y: number }[];
      }[];
      return {
        id: set.id,
        c27: list.find((f) => f.title === 'Leaky coupling capacitor to the output valve')!.points[0]!,
      };
    });

    await page.goto(`${ctx.product.origin}/restorations/${target.id}/help`);
    await page
      .getByLabel('The symptom, in your words')
      .fill('Distorts and fades after a few minutes; the output valve glowed red before C27 was replaced.');
    await page.getByRole('button', { name: 'Start a help request' }).click();
    await page.getByRole('heading', { name: 'Readings' }).waitFor();
    await page.getByText('HT at can section A').first().waitFor();
    await expectAccessible(page, 'help tab');
    await page.getByRole('button', { name: 'Make a read-only link' }).click();
    const url = await page.getByLabel(/^Link/).inputValue();
    expect(url).toMatch(/\/shared\/help\/[\w-]{43}$/);

    // A fresh browser with no account.
    const stranger = await newPage(ctx.browser);
    const strangerMessages = watchConsole(stranger);
    await stranger.goto(url);
    await stranger.getByRole('heading', { name: /Meridian 54/ }).waitFor();
    await stranger.getByText('HT at can section A').waitFor();
    await stranger.getByTestId('help-pin').first().waitFor({ state: 'attached' });
    const pins = await stranger
      .getByTestId('help-pin')
      .evaluateAll((els) =>
        els.map((e) => ({ x: Number(e.getAttribute('data-x')), y: Number(e.getAttribute('data-y')) })),
      );
    expect(pins).toContainEqual(target.c27);
    // Each pinned spot comes with its close-up, cut from the original and signed for this reader.
    const closeup = stranger.getByTestId('help-closeup').first();
    await closeup.waitFor();
    await expect
      .poll(async () => closeup.evaluate((img: HTMLImageElement) => img.complete && img.naturalWidth > 0))
      .toBe(true);
    expect(await stranger.locator('meta[name="robots"]').getAttribute('content')).toMatch(/noindex/);
    expect(await stranger.getByText('Positive grid with a red anode').count()).toBe(0);
    expect(await stranger.getByText('Perished rubber wiring').count()).toBe(0);
    expect(await stranger.getByText('Imogen').count()).toBe(0);
    expect(await stranger.getByRole('button', { name: 'Sign out' }).count()).toBe(0);
    await expectAccessible(stranger, 'shared help page');
    // Printed (A4, print CSS), the request fits one or two pages and leaves out the reply form.
    await stranger.emulateMedia({ media: 'print' });
    expect(await stranger.getByRole('button', { name: 'Send reply' }).isVisible()).toBe(false);
    const printed = await pdfPages(await stranger.pdf({ format: 'A4', preferCSSPageSize: true }));
    expect(printed.length).toBeLessThanOrEqual(2);
    expect(printed.join('\n')).toContain('HT at can section A');
    await stranger.emulateMedia({ media: 'screen' });

    await stranger.getByLabel('Your name').fill('Club member');
    await stranger
      .getByLabel('Your reply')
      .fill('Check the new grid leak is really 470 kΩ and measure V5 pin 2 again warm.');
    await stranger.getByRole('button', { name: 'Send reply' }).click();
    await stranger.getByText('Your reply was sent to the technician').waitFor();

    await page.reload();
    await page.getByText('waiting for approval').waitFor();
    await page.getByRole('button', { name: 'Approve reply' }).click();
    await expect.poll(async () => page.getByText('waiting for approval').count()).toBe(0);

    await stranger.reload();
    await stranger.getByText('Check the new grid leak is really 470 kΩ').waitFor();
    expect(messages).toEqual([]);
    expect(strangerMessages).toEqual([]);
  });
});
