// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Comment } from '../../../../shared/schemas/comments';
import { fakeApi, ok } from '../../../testing/fake-api';
import { makeComment, makeFinding, members } from '../../../testing/finding-fixtures';
import { renderWithQueries } from '../../../testing/render';
import { Thread } from './thread';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
});

const finding = makeFinding(1, { ownerVisible: true });

function threadApi(comments: Comment[]) {
  return fakeApi(({ method, path, body }) => {
    if (method === 'GET' && path === '/findings/1/comments') return ok(comments);
    if (method === 'POST' && path === '/findings/1/comments')
      return { status: 201, body: makeComment(99, body as Partial<Comment>) };
    if (method === 'DELETE' && path.startsWith('/comments/')) return { status: 204 };
    return undefined;
  });
}

describe('thread', () => {
  it('when comments arrive, then they are oldest first, keep their line breaks, link their links and mark mentions, edits and deletions', async () => {
    threadApi([
      makeComment(3, {
        body: '',
        deletedAt: '2026-11-20T14:00:00.000Z',
        createdAt: '2026-11-20T13:00:00.000Z',
        authorId: 2,
        authorName: 'Teodor Brask',
      }),
      makeComment(1, {
        body: 'Readings at the can:\nHT 250 V\nsee https://example.org/notes/c15b.',
        createdAt: '2026-11-20T10:00:00.000Z',
        internal: false,
      }),
      makeComment(2, {
        body: '@Teodor Brask is 250 V high for this set?',
        createdAt: '2026-11-20T11:00:00.000Z',
        editedAt: '2026-11-20T11:05:00.000Z',
      }),
    ]);
    renderWithQueries(<Thread finding={finding} role="technician" meId={1} members={members} />);

    const items = within(await screen.findByRole('list')).getAllByRole('listitem');
    expect(items).toHaveLength(3);

    const [first, second, third] = items as [HTMLElement, HTMLElement, HTMLElement];
    const body = first.querySelector('p.whitespace-pre-wrap');
    expect(body?.textContent).toBe('Readings at the can:\nHT 250 V\nsee https://example.org/notes/c15b.');
    const link = within(first).getByRole('link', { name: 'https://example.org/notes/c15b' });
    expect(link).toHaveAttribute('href', 'https://example.org/notes/c15b');
    expect(link).toHaveAttribute('target', '_blank');
    expect(link).toHaveAttribute('rel', 'noopener noreferrer');
    expect(first).toHaveTextContent('◇ Shared with owner');

    expect(within(second).getByText('@Teodor Brask').tagName).toBe('MARK');
    expect(second).toHaveTextContent('· edited');
    expect(second).toHaveTextContent('◆ Internal');

    expect(within(third).getByText('Comment deleted')).toBeInTheDocument();
    expect(within(third).queryByRole('button')).not.toBeInTheDocument();
  });

  it('when there are no comments, then it says so', async () => {
    threadApi([]);
    renderWithQueries(<Thread finding={finding} role="mentor" meId={2} members={members} />);
    expect(await screen.findByText('No comments yet')).toBeInTheDocument();
  });

  it('when a comment carries a script link, then it stays plain text', async () => {
    threadApi([makeComment(1, { body: 'javascript:alert(1) and <b>bold</b>' })]);
    renderWithQueries(<Thread finding={finding} role="technician" meId={1} members={members} />);
    expect(await screen.findByText('javascript:alert(1) and <b>bold</b>')).toBeInTheDocument();
    expect(screen.queryByRole('link')).not.toBeInTheDocument();
  });

  it('when a mentor reads the thread, then they edit only their own comments and delete none of the others', async () => {
    threadApi([makeComment(1, { authorId: 1 }), makeComment(2, { authorId: 2, authorName: 'Teodor Brask' })]);
    renderWithQueries(<Thread finding={finding} role="mentor" meId={2} members={members} />);
    await screen.findByText('Comment 1');
    expect(screen.getAllByRole('button', { name: /^Edit comment/ }).map((b) => b.getAttribute('aria-label'))).toEqual([
      'Edit comment by Teodor Brask',
    ]);
    expect(screen.getAllByRole('button', { name: /^Delete comment/ }).map((b) => b.getAttribute('aria-label'))).toEqual(
      ['Delete comment by Teodor Brask'],
    );
  });

  it('when a technician deletes someone else’s comment, then it is confirmed first and sent', async () => {
    const api = threadApi([makeComment(2, { authorId: 2, authorName: 'Teodor Brask' })]);
    renderWithQueries(<Thread finding={finding} role="technician" meId={1} members={members} />);
    const user = userEvent.setup();
    await user.click(await screen.findByRole('button', { name: 'Delete comment by Teodor Brask' }));
    const asked = await screen.findByRole('dialog', { name: 'Delete this comment?' });
    await user.click(within(asked).getByRole('button', { name: 'Delete comment' }));
    await waitFor(() => expect(api.calls).toContainEqual({ method: 'DELETE', path: '/comments/2', body: undefined }));
  });

  it('when a technician types @ and picks a member with the keyboard, then Ctrl+Enter sends an internal comment by default', async () => {
    const api = threadApi([]);
    renderWithQueries(<Thread finding={finding} role="technician" meId={1} members={members} />);
    const user = userEvent.setup();
    const box = await screen.findByRole('textbox', { name: 'Add a comment' });
    expect(screen.getByRole('radio', { name: /Internal \(technicians and mentors only\)/ })).toBeChecked();

    await user.type(box, 'Could @t');
    const list = screen.getByRole('listbox', { name: 'Members to mention' });
    // Internal by default: the owner is not offered, and nor is the writer.
    expect(
      within(list)
        .getAllByRole('option')
        .map((o) => o.textContent),
    ).toEqual(['Teodor BraskMentor']);
    await user.keyboard('{ArrowDown}{Enter}');
    expect(box).toHaveValue('Could @Teodor Brask ');
    expect(screen.queryByRole('listbox')).not.toBeInTheDocument();

    await user.type(box, 'check R23?{Control>}{Enter}{/Control}');
    await waitFor(() =>
      expect(api.calls.find((c) => c.method === 'POST')?.body).toEqual({
        body: 'Could @Teodor Brask check R23?',
        internal: true,
      }),
    );
    await waitFor(() => expect(box).toHaveValue(''));
  });

  it('when a technician chooses to share and Escape closes the mention list, then the comment goes out shared', async () => {
    const api = threadApi([]);
    renderWithQueries(<Thread finding={finding} role="technician" meId={1} members={members} />);
    const user = userEvent.setup();
    await user.click(await screen.findByRole('radio', { name: 'Shared with the owner' }));
    const box = screen.getByRole('textbox', { name: 'Add a comment' });
    await user.type(box, 'Hello @M');
    expect(screen.getByRole('option', { name: /Mara Lind/ })).toHaveAttribute('aria-selected', 'true');
    await user.keyboard('{Escape}');
    expect(screen.queryByRole('listbox')).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Send comment' }));
    await waitFor(() =>
      expect(api.calls.find((c) => c.method === 'POST')?.body).toEqual({ body: 'Hello @M', internal: false }),
    );
  });
});
