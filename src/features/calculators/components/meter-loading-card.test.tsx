// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it } from 'vitest';
import { typeInto } from '../../../testing/render';
import { MeterLoadingCard } from './meter-loading-card';

afterEach(cleanup);

describe('meter loading calculator', () => {
  it('when the textbook divider is entered, then the 20 kΩ/V meter’s 10 V means 15 V unloaded', async () => {
    // textbook worked example (edudirectory "Meters: loading effect"): 20,000 Ω/V on 20 V across 400 k ∥ 400 k reads 10 V of 15 V
    render(<MeterLoadingCard />);
    await typeInto('Chart says (V)', '10');
    await typeInto('Source resistance there (Ω)', '200k');
    await typeInto('Chart’s meter (Ω/V)', '20k');
    await typeInto('Chart’s meter range (V)', '20');
    expect(screen.getByText('15 V')).toBeInTheDocument();
    expect(screen.getByText('14.7 V')).toBeInTheDocument(); // by hand: 15 × 10 M / 10.2 M on a 10 MΩ digital meter
  });

  it('when an analogue 20 kΩ/V meter replaces the chart’s 1 kΩ/V one, then the words say how much higher it reads', async () => {
    render(<MeterLoadingCard />);
    await typeInto('Chart says (V)', '100');
    await typeInto('Chart’s meter range (V)', '1000');
    await userEvent.setup().selectOptions(screen.getByLabelText('Your meter'), 'analogue');
    await typeInto('Your meter’s range (V)', '250');
    // by hand: 100 × 1.1 M / 1 M = 110 V open; 110 × 5 M / 5.1 M = 107.8 V
    expect(
      screen.getByText("A 20 kΩ/V meter here reads about 8 % higher than the manual's 1 kΩ/V meter."),
    ).toBeInTheDocument();
  });

  it('when a reading is given, then it is judged against what your meter should read', async () => {
    render(<MeterLoadingCard />);
    await typeInto('Your reading (V), optional', '240');
    expect(screen.getByText('within')).toBeInTheDocument(); // by hand: default chart 180 V behind 100 kΩ on 300 kΩ → 240 V open, 237.6 V on 10 MΩ
  });
});
