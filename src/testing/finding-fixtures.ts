import type { Role } from '../../shared/permissions';
import type { Comment } from '../../shared/schemas/comments';
import type { Finding } from '../../shared/schemas/findings';

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

/** A comment as the API answers it; tests override what they care about. */
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
export const members: { userId: number; name: string; role: Role }[] = [
  { userId: 1, name: 'Tessa Bench', role: 'technician' },
  { userId: 2, name: 'Teodor Brask', role: 'mentor' },
  { userId: 3, name: 'Mara Lind', role: 'owner' },
];
