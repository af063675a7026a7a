// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { typeInto } from '../../../testing/render';
import { RcCornerCard } from './rc-corner-card';

afterEach(cleanup);

describe('RC corner calculator', () => {
  it('when 4k7 and 47n are typed, then it shows about 720 Hz as the person types', async () => {
    render(<RcCornerCard />);
    await typeInto('Resistance (Ω)', '4k7');
    await typeInto('Capacitance (F)', '47n');
    // Textbook passive low-pass worked example (from memory): 4.7 kΩ with 47 nF gives 720 Hz.
    expect(screen.getByText(/^720(\.\d+)? Hz$/)).toBeInTheDocument();
    expect(screen.getByText('reads as 4.7 kΩ')).toBeInTheDocument();
    expect(screen.getByText('reads as 47 nF')).toBeInTheDocument();
  });

  it('when a value cannot be read, then the field says why in words and the card does not crash', async () => {
    render(<RcCornerCard />);
    const input = await typeInto('Resistance (Ω)', 'lots');
    expect(input).toHaveAttribute('aria-invalid', 'true');
    expect(input).toHaveAccessibleDescription(/'lots' is not a value Gridleak can read/);
    expect(screen.getByText(/Write it like 4\.7k, 4k7, 330R, 6n8/)).toBeInTheDocument();
    expect(screen.getByText('Correct the value marked above to see the result.')).toBeInTheDocument();
    expect(screen.queryByText(/Hz$/)).not.toBeInTheDocument();
  });

  it('when a value in the wrong unit is typed, then the library’s reason is shown beside the field', async () => {
    render(<RcCornerCard />);
    const input = await typeInto('Capacitance (F)', '250 V');
    expect(input).toHaveAccessibleDescription(/it is in V but F was expected here/);
  });

  it('when the library refuses the numbers, then its reason is shown instead of a result', async () => {
    render(<RcCornerCard />);
    await typeInto('Resistance (Ω)', '0');
    expect(screen.getByText(/resistance \(Ω\) must be a number above zero/)).toBeInTheDocument();
  });

  it('when a negative value is typed where none can exist, then the field is marked invalid and says so', async () => {
    render(<RcCornerCard />);
    const input = await typeInto('Resistance (Ω)', '-15k');
    expect(input).toHaveAttribute('aria-invalid', 'true');
    expect(input).toHaveAccessibleDescription('A resistance cannot be negative here: enter it without the minus sign.');
    expect(screen.getByText('Correct the value marked above to see the result.')).toBeInTheDocument();
    const capacitance = await typeInto('Capacitance (F)', '-47n');
    expect(capacitance).toHaveAccessibleDescription(
      'A capacitance cannot be negative here: enter it without the minus sign.',
    );
  });
});
