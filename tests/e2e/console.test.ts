import { describe, expect, it } from 'vitest';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

describe('the console', () => {
  it('when a signed-out visitor opens the sign-in page, then nothing is logged: no failed session check, no router warning', async () => {
    const page = await newPage(ctx.browser);
    const messages = watchConsole(page);
    await page.goto(`${ctx.product.origin}/sign-in`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.goto(`${ctx.product.origin}/restorations/1`);
    // The sign-in gate takes over a page that needs a session.
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    expect(messages).toEqual([]);
  });

  it('when a technician signs out and the tab then opens a photo page, then the sign-in gate takes over and nothing is logged', async () => {
    const page = await newPage(ctx.browser);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    // Signed in, this tab starts a page's data together with the sign-in check; signed out, it must ask for nothing.
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page
      .getByRole('link', { name: 'Sign in' })
      .or(page.getByRole('button', { name: 'Sign in' }))
      .first()
      .waitFor();
    const messages = watchConsole(page);
    await page.goto(`${ctx.product.origin}/restorations/1/photos/1`);
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    expect(messages).toEqual([]);
  });

  it('when a technician signs in and opens the bench, then nothing is logged', async () => {
    const page = await newPage(ctx.browser);
    const messages = watchConsole(page);
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    await page.goto(ctx.product.origin);
    await page.getByRole('heading', { name: 'The bench' }).waitFor();
    await page.getByRole('link', { name: /OV-54-20417/ }).waitFor();
    expect(messages).toEqual([]);
  });
});

describe('the header on a phone', () => {
  it('when a technician is signed in on a phone, then the header is one compact row and its Menu opens the links', async () => {
    const page = await newPage(ctx.browser, { width: 390, height: 844 });
    await signInAs(page, ctx.product.origin, 'mara@cobbold-lane.test');
    await page.goto(`${ctx.product.origin}/calculators`);
    await page.getByRole('heading', { name: 'Bench calculators' }).waitFor();
    const header = page.locator('header').first();
    // One row of 44 px controls plus padding; it used to wrap to about 300 px.
    expect((await header.boundingBox())!.height).toBeLessThan(80);
    const menu = page.getByRole('button', { name: 'Menu' });
    expect(await menu.getAttribute('aria-expanded')).toBe('false');
    await menu.click();
    expect(await menu.getAttribute('aria-expanded')).toBe('true');
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Bench' }).click();
    await page.getByRole('heading', { name: 'The bench' }).waitFor();
    // A new page closes the menu.
    expect(await menu.getAttribute('aria-expanded')).toBe('false');
    expect(await page.getByRole('button', { name: 'Sign out' }).isVisible()).toBe(false);
  });
});
