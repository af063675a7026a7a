import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import type { ReactNode } from 'react';
import { MemoryRouter, Route, Routes, useLocation } from 'react-router';
import type { Finding } from '../../../../shared/schemas/findings';
import type { Comment } from '../../../../shared/schemas/comments';
import { apiError } from '../../../testing/fake-api';
import type { FindingMember } from './finding-format';
import { testQueryClient } from '../../../testing/render';

/** A finding as the API answers it; tests override what they care about. */
export function makeFinding(id: number, overrides: Partial<Finding> = {}): Finding {
  return {
    id,
    photoId: 3,
    restorationId: 7,
    number: id,
    shape: 'pin',
    points: [{ x: 0.4, y: 0.6 }],
    title: `Finding ${id}`,
    componentRef: '',
    kind: 'note',
    severity: 'info',
    status: 'observed',
    dismissReason: null,
    ownerVisible: false,
    authorId: 1,
    authorName: 'Tessa Bench',
    questionOpen: false,
    commentCount: 0,
    createdAt: '2026-11-20T09:00:00.000Z',
    updatedAt: '2026-11-20T09:00:00.000Z',
    ...overrides,
  };
}

export function makeComment(id: number, overrides: Partial<Comment> = {}): Comment {
  return {
    id,
    findingId: 1,
    body: `Comment ${id}`,
    internal: true,
    authorId: 1,
    authorName: 'Tessa Bench',
    mentions: [],
    createdAt: `2026-11-20T1${id % 10}:00:00.000Z`,
    editedAt: null,
    deletedAt: null,
    ...overrides,
  };
}

/** An invented workshop: one technician, one mentor, one owner. */
export const members: FindingMember[] = [
  { userId: 1, name: 'Tessa Bench', role: 'technician' },
  { userId: 2, name: 'Teodor Brask', role: 'mentor' },
  { userId: 3, name: 'Mara Lind', role: 'owner' },
];

export { fakeApi, ok, type Call, type Reply } from '../../../testing/fake-api';
/** A refusal as the server words it, with the code the server sends for that status. */
export const refuse = (status: number, message: string) => apiError(status, message);

function Location() {
  return <div data-testid="location">{useLocation().pathname}</div>;
}

/** Renders with a fresh query cache (no retries) inside a memory router that shows where it has navigated to. */
export function renderWithApp(ui: ReactNode, path = '/restorations/7/findings') {
  const client = testQueryClient();
  const result = render(
    <QueryClientProvider client={client}>
      <MemoryRouter initialEntries={[path]}>
        <Routes>
          <Route
            path="*"
            element={
              <>
                {ui}
                <Location />
              </>
            }
          />
        </Routes>
      </MemoryRouter>
    </QueryClientProvider>,
  );
  return { client, ...result };
}
