// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Comment } from '../../../../shared/schemas/comments';
import { type Reply, apiError, fakeApi, ok } from '../../../testing/fake-api';
import { makeComment, makeFinding, members } from '../../../testing/finding-fixtures';
import { renderWithQueries } from '../../../testing/render';
import { Thread } from './thread';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

/** The thread's API, answering each comment post with the next of `posts` (a thrown error is a lost connection). */
function postsAnswered(posts: (() => Reply)[]) {
  const api = fakeApi(({ method, path, body }) => {
    if (method === 'GET' && path === '/findings/1/comments') return ok([]);
    if (method === 'POST' && path === '/findings/1/comments')
      return posts.shift()?.() ?? { status: 201, body: makeComment(99, body as Partial<Comment>) };
    return undefined;
  });
  const postKeys = () => api.calls.flatMap((c, i) => (c.method === 'POST' ? [api.headers[i]!['idempotency-key']] : []));
  return { ...api, postKeys };
}

async function send(text: string) {
  const user = userEvent.setup();
  const box = screen.getByLabelText('Add a comment');
  await user.clear(box);
  await user.type(box, text);
  await user.click(screen.getByRole('button', { name: 'Send comment' }));
}

describe('posting a comment again', () => {
  it('when the connection drops after sending, then the automatic retry carries the same Idempotency-Key', async () => {
    const api = postsAnswered([
      () => {
        throw new TypeError('Failed to fetch');
      },
    ]);
    renderWithQueries(<Thread finding={makeFinding(1)} role="technician" meId={1} members={members} />);
    await screen.findByText('No comments yet');
    await send('Reflowed the tag strip');
    await waitFor(() => expect(api.postKeys()).toHaveLength(2), { timeout: 4000 });
    const [first, retry] = api.postKeys();
    expect(first).toMatch(/^[0-9a-f]{32}$/);
    expect(retry).toBe(first);
  });

  it('when the same text is sent again after an error, then the key is reused; a new comment gets a new key', async () => {
    const api = postsAnswered([() => apiError(503, 'We could not send the e-mail just now, so nothing was saved.')]);
    renderWithQueries(<Thread finding={makeFinding(1)} role="technician" meId={1} members={members} />);
    await screen.findByText('No comments yet');
    await send('HT is 262 V at C30');
    await screen.findByText(/nothing was saved/);
    await userEvent.setup().click(screen.getByRole('button', { name: 'Send comment' }));
    await waitFor(() => expect(api.postKeys()).toHaveLength(2));
    await waitFor(() => expect(screen.getByLabelText('Add a comment')).toHaveValue(''));
    await send('Next: the output stage');
    await waitFor(() => expect(api.postKeys()).toHaveLength(3));
    const [a, b, c] = api.postKeys();
    expect(b).toBe(a);
    expect(c).not.toBe(a);
  });
});
