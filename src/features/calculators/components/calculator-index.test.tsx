// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { afterEach, describe, expect, it } from 'vitest';
import { calculatorAnchor, calculatorCatalogue, matchesSearch } from './calculator-catalogue';
import { CalculatorIndex } from './calculator-index';

afterEach(cleanup);

function Page() {
  const [search, setSearch] = useState('');
  const groups = calculatorCatalogue
    .map((g) => ({ title: g.title, entries: g.entries.filter((e) => matchesSearch(e, search)) }))
    .filter((g) => g.entries.length > 0);
  return (
    <CalculatorIndex
      groups={groups}
      search={search}
      onSearch={setSearch}
      shown={groups.reduce((n, g) => n + g.entries.length, 0)}
    />
  );
}

describe('calculator index', () => {
  it('when the page opens, then every calculator is linked from the index by its anchor', () => {
    render(<Page />);
    const index = screen.getByRole('navigation', { name: 'Calculators on this page' });
    const total = calculatorCatalogue.reduce((n, g) => n + g.entries.length, 0);
    expect(within(index).getAllByRole('link')).toHaveLength(total);
    expect(within(index).getByRole('link', { name: 'Cathode bias' })).toHaveAttribute(
      'href',
      `#${calculatorAnchor('Cathode bias')}`,
    );
  });

  it('when words are typed in the search box, then only calculators with every word stay, and the count is announced', async () => {
    const user = userEvent.setup();
    render(<Page />);
    await user.type(screen.getByRole('searchbox', { name: 'Find a calculator' }), 'heater');
    const links = within(screen.getByRole('navigation'))
      .getAllByRole('link')
      .map((a) => a.textContent);
    expect(links).toContain('Series heater string');
    expect(links).not.toContain('Expected ESR');
    expect(screen.getByRole('status')).toHaveTextContent(`${links.length} calculator`);
    await user.clear(screen.getByRole('searchbox'));
    await user.type(screen.getByRole('searchbox'), 'no such thing');
    expect(screen.getByRole('status')).toHaveTextContent('No calculator matches');
  });
});
