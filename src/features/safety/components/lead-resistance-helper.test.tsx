// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { LeadResistanceHelper } from './lead-resistance-helper';

afterEach(cleanup);

describe('lead resistance helper', () => {
  it('when 2 m of 0.75 mm² flex is entered, then it offers 0.052 Ω (26 mΩ/m, IEC 60228 class 5, from memory) for the earth limit', async () => {
    const onUse = vi.fn();
    const user = userEvent.setup();
    render(<LeadResistanceHelper onUse={onUse} />);
    expect(screen.getByRole('button', { name: 'Use the lead’s resistance' })).toBeDisabled();
    await user.type(screen.getByLabelText('Lead length (m)'), '2');
    await user.click(screen.getByRole('button', { name: 'Use 0.052 Ω' }));
    expect(onUse).toHaveBeenCalledWith('0.052');
  });
});
