// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { NewFindingForm } from '../../features/markup/components/new-finding-form';
import { fakeApi, makeFinding, ok, renderWithApp } from '../../features/findings/components/findings-test-support';
import { SameReferenceFinding } from '../../features/findings/components/same-reference-finding';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const Form = () => (
  <NewFindingForm shape="pin" busy={false} onSubmit={vi.fn()} onCancel={vi.fn()} refNotice={(ref) => <SameReferenceFinding restorationId={7} componentRef={ref} />} />
);

describe('a second finding for the same reference', () => {
  it('when the reference typed for a new finding is already on one, then the form names the first and links to it', async () => {
    const first = makeFinding(40, { number: 3, componentRef: 'C27', title: 'Leaky coupling capacitor', photoId: 11 });
    fakeApi(({ path }) => (path === '/restorations/7/findings' ? ok([makeFinding(52, { number: 9, componentRef: 'C27' }), first, makeFinding(41, { componentRef: 'R20' })]) : undefined));
    renderWithApp(<Form />);
    const user = userEvent.setup();
    await user.type(screen.getByLabelText('Component reference'), 'c27');
    const link = await screen.findByRole('link', { name: 'Open #3' });
    expect(link).toHaveAttribute('href', '/restorations/7/photos/11/findings/40');
    expect(screen.getByRole('status')).toHaveTextContent('C27 already has finding #3, “Leaky coupling capacitor”.');
    await user.clear(screen.getByLabelText('Component reference'));
    await user.type(screen.getByLabelText('Component reference'), 'V5');
    expect(screen.queryByRole('link', { name: /^Open #/ })).not.toBeInTheDocument();
  });
});
