// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { typeInto } from '../../../testing/render';
import { AlignmentCard } from './alignment-card';

afterEach(cleanup);

describe('alignment aids', () => {
  it('when an IF is 75 kHz off its 470 kHz, then it is out, not 16 % within a per-cent band', async () => {
    render(<AlignmentCard />);
    await userEvent.setup().selectOptions(screen.getByLabelText('Set’s IF'), '470000');
    await typeInto('IF measured (Hz)', '395k');
    expect(screen.getByText('out')).toBeInTheDocument(); // common practice, no source: an AM IF within ±2 kHz
    expect(screen.getByText('\u221275 kHz')).toBeInTheDocument();
  });

  it('when the dial says 1500 m, then it is 200 kHz; 1 MHz is 300 m', async () => {
    render(<AlignmentCard />);
    expect(screen.getByText('200 kHz')).toBeInTheDocument(); // by hand: 300,000 / 1,500
    await typeInto('Dial mark', '1 MHz');
    expect(screen.getByText('300 m')).toBeInTheDocument(); // by hand: 300,000 / 1,000
  });
});
