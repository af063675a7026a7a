import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { expect } from 'vitest';

/**
 * Runs axe-core on the page as it stands and fails with a readable list of WCAG 2.1 A/AA violations
 * (rule, what it checks, where). Call it on each main screen of a journey once its content has loaded.
 */
export async function expectAccessible(page: Page, screen: string) {
  const { violations } = await new AxeBuilder({ page })
    .withTags(['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'])
    .analyze();
  const found = violations.map(
    (v) =>
      `${v.id} (${v.impact}): ${v.help} at ${v.nodes
        .slice(0, 5)
        .map((n) => n.target.join(' '))
        .join(' | ')}`,
  );
  expect(found, `accessibility of ${screen}`).toEqual([]);
}
