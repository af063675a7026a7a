import { describe, expect, it } from 'vitest';
import { artifactPath } from '../support/artifacts';
import { expectAccessible } from '../support/axe';
import { newPage } from '../support/browser';
import { watchConsole } from '../support/console';
import { firstLink, mailTo, signInAs } from '../support/journey';
import { useProductAndBrowser } from '../support/journey-setup';

const ctx = useProductAndBrowser();

const password = 'a long evening with the dial cord';

describe('inviting people to a restoration', () => {
  it('when the technician invites a mentor and an owner, then each joins from the e-mail link; a third account gets "not found"', async () => {
    const tech = await newPage(ctx.browser);
    const techMessages = watchConsole(tech);
    await signInAs(tech, ctx.product.origin, 'mara@cobbold-lane.test');
    // The set's card on the bench (its serial), not its lines under Recent activity.
    await tech.getByRole('link', { name: /KW-3381/ }).click();
    await tech.getByRole('link', { name: 'People' }).click();
    const restorationUrl = tech.url().replace(/\/people$/, '');

    for (const [email, role] of [
      ['orla.mentor@example.test', 'mentor'],
      ['bram.owner@example.test', 'owner'],
    ] as const) {
      await tech.getByLabel('E-mail', { exact: true }).fill(email);
      await tech.getByLabel('Role', { exact: true }).selectOption(role);
      await tech.getByRole('button', { name: 'Send invitation' }).click();
      await tech.getByText('Invitation sent').waitFor();
      await tech.getByRole('listitem').filter({ hasText: email }).waitFor();
    }
    await tech.screenshot({ path: artifactPath('people-tab.png'), fullPage: true });
    await expectAccessible(tech, 'the People tab');
    expect(techMessages).toEqual([]);

    for (const [email, name] of [
      ['orla.mentor@example.test', 'Orla Finch'],
      ['bram.owner@example.test', 'Bram Holt'],
    ]) {
      const link = firstLink(await mailTo(ctx.product.origin, email!, /invited you/));
      expect(link).toMatch(/\/invitations\/[A-Za-z0-9_-]+$/);
      const page = await newPage(ctx.browser, { width: 390, height: 844 });
      const messages = watchConsole(page);
      await page.goto(link);
      await page.getByText('invited').first().waitFor();
      await expectAccessible(page, 'the invitation page');
      await page.getByLabel('Your name').fill(name!);
      await page.getByLabel('Password').fill(password);
      await page.getByRole('button', { name: 'Create account and join' }).click();
      await page.getByRole('heading', { name: /Kestrel Wireless Co\. Wren AC\/DC/ }).waitFor();
      expect(page.url()).toBe(restorationUrl);
      await expectAccessible(page, `the restoration as a new ${name === 'Orla Finch' ? 'mentor' : 'owner'}`);
      expect(messages).toEqual([]);
    }

    const third = await newPage(ctx.browser);
    const thirdMessages = watchConsole(third);
    await third.goto(`${ctx.product.origin}/sign-up`);
    await expectAccessible(third, 'the sign-up page');
    await third.getByLabel('Your name').fill('Cass Nobody');
    await third.getByLabel('E-mail').fill('cass@example.test');
    await third.getByLabel('Password').fill(password);
    await third.getByRole('button', { name: 'Create account' }).click();
    await third.getByText('Check your e-mail').waitFor();
    await third.goto(firstLink(await mailTo(ctx.product.origin, 'cass@example.test', /Confirm/)));
    await third.getByRole('heading', { name: 'The bench' }).waitFor();
    // Quiet up to here; the restoration that is not theirs is refused on purpose next.
    expect(thirdMessages).toEqual([]);
    await third.goto(restorationUrl);
    await third.getByText('Restoration not found').waitFor();
    await expectAccessible(third, 'a restoration that is not theirs');
    await third.screenshot({ path: artifactPath('not-a-member.png') });
  });
});
