import { readFile } from 'node:fs/promises';
import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

describe('the ledger as a spreadsheet', () => {
  it('when the technician exports the ledger from the Parts tab, then a CSV parser reads references in parts-list order and ISO 8601 dates', async () => {
    const page = await newPage(ctx.browser, { width: 1280, height: 900 });
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    await page.getByRole('link', { name: /OV-54-20417/ }).click();
    await page.getByRole('link', { name: 'Parts' }).click();
    const restorationId = Number(new URL(page.url()).pathname.split('/')[2]);
    // Lines of its own, under a reference letter the demo does not use, entered out of order.
    for (const componentRef of ['CX14', 'CX2', 'CX1', 'CX1a']) {
      const status = await page.evaluate(
        async ([id, ref]) =>
          (
            await fetch(`/api/restorations/${id}/parts`, {
              method: 'POST',
              headers: { 'Content-Type': 'application/json' },
              body: JSON.stringify({
                componentRef: ref,
                originalPart: 'Wax paper',
                replacementPart: 'Film',
                state: 'fitted',
              }),
            })
          ).status,
        [restorationId, componentRef] as const,
      );
      expect(status).toBe(201);
    }
    await page.reload();
    const exportLink = page.getByRole('link', { name: 'Export CSV' });
    await exportLink.waitFor();
    await expectAccessible(page, 'the parts ledger');
    const [download] = await Promise.all([page.waitForEvent('download'), exportLink.click()]);
    const text = await readFile((await download.path())!, 'utf8');
    const rows = parse(text, { bom: true, columns: true }) as Record<string, string>[];
    const ours = rows.filter((r) => /^CX/i.test(r.Reference ?? ''));
    // Counting order, a lettered sub-part after its parent (common practice, no source).
    expect(ours.map((r) => r.Reference!.toUpperCase())).toEqual(['CX1', 'CX1A', 'CX2', 'CX14']);
    for (const r of ours) expect(r.Fitted).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expect(messages).toEqual([]);
  });
});
