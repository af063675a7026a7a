import type { Finding } from '../../shared/schemas/findings';

/** A finding as the API answers it; tests override what they care about. */
export function makeFinding(id: number, overrides: Partial<Finding> = {}): Finding {
  return {
    id,
    photoId: 11,
    restorationId: 7,
    number: id,
    shape: 'pin',
    points: [{ x: 0.5, y: 0.5 }],
    title: `Finding ${id}`,
    componentRef: '',
    kind: 'note',
    severity: 'fault',
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
