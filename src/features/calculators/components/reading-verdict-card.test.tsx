// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { typeInto } from '../../../testing/render';
import { ReadingVerdictCard } from './reading-verdict-card';

afterEach(cleanup);

describe('reading against the manual', () => {
  it('when a reading is within the tolerance, then the verdict shows its glyph and word', async () => {
    render(<ReadingVerdictCard />);
    await typeInto('Your reading', '171 V'); // by hand: 171 / 180 − 1 = −5 % against ±10 %
    expect(screen.getByText('within')).toBeInTheDocument();
    expect(screen.getByText('✓')).toBeInTheDocument();
    expect(screen.getByText('−5 %')).toBeInTheDocument();
  });

  it('when a reading is past the tolerance by less than half again, then it is marginal', async () => {
    render(<ReadingVerdictCard />);
    await typeInto('Your reading', '200 V'); // by hand: +11.1 % against ±10 %
    expect(screen.getByText('marginal')).toBeInTheDocument();
    expect(screen.getByText('◐')).toBeInTheDocument();
  });

  it('when a reading is far out, then it is out', async () => {
    render(<ReadingVerdictCard />);
    await typeInto('Your reading', '216'); // a bare number takes the expected value's unit; by hand +20 %
    expect(screen.getByText('out')).toBeInTheDocument();
    expect(screen.getByText('+20 %')).toBeInTheDocument();
  });

  it('when the tolerance is typed as an IEC 60062 letter, then it is read as the band', async () => {
    render(<ReadingVerdictCard />);
    await typeInto('Tolerance (%)', 'J'); // IEC 60062: J = ±5 %
    await typeInto('Your reading', '198 V'); // by hand: +10 %, past 1.5 × 5 %
    expect(screen.getByText('out')).toBeInTheDocument();
    expect(screen.getByText('±5 %')).toBeInTheDocument();
  });

  it('when the units differ, then it refuses in words rather than judging', async () => {
    render(<ReadingVerdictCard />);
    await typeInto('Expected (manual)', '2k2');
    expect(screen.getByText(/compare like with like/)).toBeInTheDocument();
    expect(screen.queryByText('within')).not.toBeInTheDocument();
  });
});
