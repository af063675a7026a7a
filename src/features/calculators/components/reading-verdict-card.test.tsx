// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { ReadingVerdictCard } from './reading-verdict-card';

afterEach(cleanup);

async function typeInto(label: string, text: string) {
  const user = userEvent.setup();
  const input = screen.getByLabelText(label);
  await user.clear(input);
  await user.type(input, text);
}

describe('reading against the manual', () => {
  it('when a reading is within the tolerance, then the verdict shows its glyph and word', async () => {
    render(<ReadingVerdictCard />);
    await typeInto('Your reading', '240 V');
    expect(screen.getByText('within')).toBeInTheDocument();
    expect(screen.getByText('✓')).toBeInTheDocument();
    expect(screen.getByText('−4 %')).toBeInTheDocument();
  });

  it('when a reading is past the tolerance by less than half again, then it is marginal', async () => {
    render(<ReadingVerdictCard />);
    await typeInto('Your reading', '280 V'); // +12 % against ±10 %
    expect(screen.getByText('marginal')).toBeInTheDocument();
    expect(screen.getByText('◐')).toBeInTheDocument();
  });

  it('when a reading is far out, then it is out', async () => {
    render(<ReadingVerdictCard />);
    await typeInto('Your reading', '300'); // a bare number takes the expected value's unit
    expect(screen.getByText('out')).toBeInTheDocument();
    expect(screen.getByText('+20 %')).toBeInTheDocument();
  });

  it('when the units differ, then it refuses in words rather than judging', async () => {
    render(<ReadingVerdictCard />);
    await typeInto('Expected (manual)', '4k7');
    expect(screen.getByText(/compare like with like/)).toBeInTheDocument();
    expect(screen.queryByText('within')).not.toBeInTheDocument();
  });
});
