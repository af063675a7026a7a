// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { NewFindingForm } from '../../features/markup/components/new-finding-form';
import { FindingPanel } from '../../features/findings/components/finding-panel';
import { fakeApi, ok } from '../../testing/fake-api';
import { makeFinding, members } from '../../testing/finding-fixtures';
import { renderWithQueries } from '../../testing/render';
import { SameReferenceFinding } from '../../features/findings/components/same-reference-finding';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const Form = () => (
  <NewFindingForm
    shape="pin"
    busy={false}
    onSubmit={vi.fn()}
    onCancel={vi.fn()}
    refNotice={(ref) => <SameReferenceFinding restorationId={7} componentRef={ref} />}
  />
);

describe('a second finding for the same reference', () => {
  it('when the reference typed for a new finding is already on one, then the form names the first and links to it', async () => {
    const first = makeFinding(40, { number: 3, componentRef: 'C27', title: 'Leaky coupling capacitor', photoId: 11 });
    fakeApi(({ path }) =>
      path === '/restorations/7/findings'
        ? ok([makeFinding(52, { number: 9, componentRef: 'C27' }), first, makeFinding(41, { componentRef: 'R20' })])
        : undefined,
    );
    renderWithQueries(<Form />);
    const user = userEvent.setup();
    await user.type(screen.getByLabelText('Component reference'), 'c27');
    const link = await screen.findByRole('link', { name: 'Open #3' });
    expect(link).toHaveAttribute('href', '/restorations/7/photos/11/findings/40');
    expect(screen.getByRole('status')).toHaveTextContent('C27 already has finding #3, “Leaky coupling capacitor”.');
    await user.clear(screen.getByLabelText('Component reference'));
    await user.type(screen.getByLabelText('Component reference'), 'V5');
    expect(screen.queryByRole('link', { name: /^Open #/ })).not.toBeInTheDocument();
  });

  it('when the reference of an existing finding is changed to one another finding names, then the panel links to that one and still saves', async () => {
    const first = makeFinding(40, { number: 3, componentRef: 'C27', title: 'Leaky coupling capacitor', photoId: 11 });
    const edited = makeFinding(52, { number: 9, componentRef: 'R20', title: 'Hum at low volume' });
    const api = fakeApi(({ method, path, body }) => {
      if (path === '/restorations/7/findings') return ok([first, edited]);
      if (path === `/photos/${edited.photoId}/findings`) return ok([edited]);
      if (method === 'PATCH' && path === `/findings/${edited.id}`) return ok({ ...edited, ...(body as object) });
      return undefined;
    });
    renderWithQueries(<FindingPanel finding={edited} role="technician" meId={1} restorationId={7} members={members} />);
    const user = userEvent.setup();
    const field = screen.getByLabelText('Component');
    await user.clear(field);
    await user.type(field, 'c27');
    const notice = await screen.findByRole('group', { name: 'C27 already has a finding' });
    expect(within(notice).getByRole('status')).toHaveTextContent(
      'C27 already has finding #3, “Leaky coupling capacitor”.',
    );
    expect(within(notice).getByRole('link', { name: 'Open #3' })).toHaveAttribute(
      'href',
      '/restorations/7/photos/11/findings/40',
    );
    // A note, not a refusal: the reference is saved all the same.
    await user.keyboard('{Enter}');
    await vi.waitFor(() => expect(api.calls.find((c) => c.method === 'PATCH')?.body).toEqual({ componentRef: 'c27' }));
    // Saved on purpose (a part with two faults): the notice gives way to a quiet line that still links to the other.
    const quiet = await screen.findByRole('link', { name: 'finding #3, “Leaky coupling capacitor”' });
    expect(quiet.closest('p')).toHaveTextContent('Also on C27: finding #3, “Leaky coupling capacitor”');
    expect(screen.queryByRole('group', { name: /already has a finding/ })).not.toBeInTheDocument();
    // The finding's own reference is never pointed out as a duplicate of itself.
    await user.clear(field);
    await user.type(field, 'R20');
    await vi.waitFor(() =>
      expect(screen.queryByRole('group', { name: /already has a finding/ })).not.toBeInTheDocument(),
    );
  });

  it('when a finding is opened whose reference another finding shares, then it names the other quietly, with no notice', async () => {
    const first = makeFinding(40, { number: 3, componentRef: 'C27', title: 'Leaky coupling capacitor', photoId: 11 });
    const second = makeFinding(52, { number: 9, componentRef: 'c27', title: 'Cracked body' });
    fakeApi(({ path }) => {
      if (path === '/restorations/7/findings') return ok([first, second]);
      if (path === `/photos/${second.photoId}/findings`) return ok([second]);
      return undefined;
    });
    renderWithQueries(<FindingPanel finding={second} role="technician" meId={1} restorationId={7} members={members} />);
    const link = await screen.findByRole('link', { name: 'finding #3, “Leaky coupling capacitor”' });
    expect(link).toHaveAttribute('href', '/restorations/7/photos/11/findings/40');
    expect(screen.queryByRole('group', { name: /already has a finding/ })).not.toBeInTheDocument();
  });
});
