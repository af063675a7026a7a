// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen } from '@testing-library/react';
import { afterEach, describe, expect, it } from 'vitest';
import { typeInto } from '../../../testing/render';
import { HeaterChainCard } from './heater-chain-card';

afterEach(cleanup);

describe('series heater string calculator', () => {
  it('when the 100 mA five-valve string runs on 230 V, then the dropper is 874 Ω dissipating 8.74 W', async () => {
    render(<HeaterChainCard />);
    // from memory: UCH81 19 V + UF89 12.6 V + UABC80 28 V + UL84 45 V + UY85 38 V = 142.6 V at 100 mA; by hand (230 − 142.6) / 0.1
    expect(screen.getByText('874 Ω')).toBeInTheDocument();
    expect(screen.getByText('8.74 W')).toBeInTheDocument();
    expect(screen.getByText('142.6 V')).toBeInTheDocument();
    expect(screen.getByRole('note')).toHaveTextContent(/isolation transformer/);
  });

  it('when a 300 mA valve joins the string and a name is unknown, then both are said', async () => {
    render(<HeaterChainCard />);
    await typeInto('Valves in the string', 'UCH81 ECH81 QQ7');
    expect(screen.getByText(/different heater currents are mixed/)).toBeInTheDocument(); // from memory: ECH81 0.3 A, UCH81 0.1 A
    expect(screen.getByText(/check their heater data by hand: QQ7/)).toBeInTheDocument();
  });

  it('when a 50 mA dial lamp is added, then its shunt is shown', async () => {
    render(<HeaterChainCard />);
    await typeInto('Dial lamp volts (V), optional', '7');
    await typeInto('Dial lamp current (A), optional', '50m');
    expect(screen.getByText('140 Ω')).toBeInTheDocument(); // by hand: 7 V / (0.1 − 0.05) A
  });
});
