// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { OpenQuestion } from '../../../../shared/schemas/findings';
import type { Notification } from '../../../../shared/schemas/notifications';
import { fakeApi, ok } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';
import { NotificationsMenu } from './notifications-menu';
import { OpenQuestions } from './open-questions';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const note = (id: number, overrides: Partial<Notification> = {}): Notification => ({
  id,
  kind: 'mention',
  summary: `Note ${id}`,
  restorationId: 7,
  findingId: 40 + id,
  photoId: 3,
  helpRequestId: null,
  readingRequestId: null,
  read: false,
  createdAt: new Date(Date.now() - 5 * 60_000).toISOString(),
  ...overrides,
});

describe('notifications menu', () => {
  it('when there are unread items, then the button says how many, and an item marks itself read and opens its finding', async () => {
    const api = fakeApi(({ method, path }) => {
      if (method === 'GET' && path === '/notifications?limit=50')
        return ok([note(1, { summary: 'Teodor Brask mentioned you on #4 C15b' }), note(2), note(3, { read: true })]);
      if (method === 'POST' && path === '/notifications/read') return { status: 204 };
      return undefined;
    });
    renderWithQueries(<NotificationsMenu />, { showLocation: true });
    const user = userEvent.setup();
    const button = await screen.findByRole('button', { name: 'Notifications, 2 unread' });
    expect(button).toHaveAttribute('aria-expanded', 'false');

    await user.click(button);
    const panel = screen.getByRole('region', { name: 'Notifications' });
    const item = within(panel).getByRole('button', { name: /Unread: Teodor Brask mentioned you on #4 C15b/ });
    expect(item).toHaveFocus();
    expect(item).toHaveTextContent('5 minutes ago');

    await user.click(item);
    expect(api.calls).toContainEqual({ method: 'POST', path: '/notifications/read', body: { ids: [1] } });
    expect(screen.getByTestId('location')).toHaveTextContent('/restorations/7/photos/3/findings/41');
    expect(screen.queryByRole('region', { name: 'Notifications' })).not.toBeInTheDocument();
  });

  it('when Escape is pressed, then the list closes and focus returns to the button; Mark all read sends no ids', async () => {
    const api = fakeApi(({ method, path }) => {
      if (method === 'GET' && path === '/notifications?limit=50') return ok([note(1)]);
      if (method === 'POST') return { status: 204 };
      return undefined;
    });
    renderWithQueries(<NotificationsMenu />, { showLocation: true });
    const user = userEvent.setup();
    const button = await screen.findByRole('button', { name: 'Notifications, 1 unread' });
    await user.click(button);
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('region', { name: 'Notifications' })).not.toBeInTheDocument();
    expect(button).toHaveFocus();

    await user.click(button);
    await user.click(screen.getByRole('button', { name: 'Mark all read' }));
    await waitFor(() => expect(api.calls).toContainEqual({ method: 'POST', path: '/notifications/read', body: {} }));
  });

  it('when nothing is unread, then the button is simply "Notifications" and the list says nothing is new', async () => {
    fakeApi(({ path }) => (path === '/notifications?limit=50' ? ok([]) : undefined));
    renderWithQueries(<NotificationsMenu />, { showLocation: true });
    await userEvent.setup().click(await screen.findByRole('button', { name: 'Notifications' }));
    expect(await screen.findByText('Nothing new.')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Mark all read' })).toBeDisabled();
  });
});

const question: OpenQuestion = {
  findingId: 41,
  photoId: 3,
  restorationId: 7,
  set: 'Ostrander & Vale Consolette',
  number: 4,
  title: 'Is this can original?',
  componentRef: 'C15b',
  askedAt: new Date(Date.now() - 2 * 3600_000).toISOString(),
};

describe('open questions', () => {
  it('when questions are open, then each links to its finding with the set, number, reference and when it was asked', async () => {
    fakeApi(({ path }) => (path === '/questions' ? ok([question]) : undefined));
    renderWithQueries(<OpenQuestions />);
    expect(await screen.findByRole('heading', { name: 'Questions waiting for you' })).toBeInTheDocument();
    const link = screen.getByRole('link');
    expect(link).toHaveAttribute('href', '/restorations/7/photos/3/findings/41');
    expect(link).toHaveTextContent(
      /Ostrander & Vale Consolette\s*#4\s*C15b\s*Is this can original\?\s*asked 2 hours ago/,
    );
  });

  it('when no question is open, then nothing is drawn', async () => {
    const api = fakeApi(({ path }) => (path === '/questions' ? ok([]) : undefined));
    const { container } = renderWithQueries(<OpenQuestions />);
    await waitFor(() => expect(api.fetchMock).toHaveBeenCalled());
    expect(screen.queryByRole('heading')).not.toBeInTheDocument();
    expect(container.querySelector('section')).toBeNull();
  });
});
