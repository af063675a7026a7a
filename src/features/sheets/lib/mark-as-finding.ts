import type { Finding } from '../../../../shared/schemas/findings';
import type { ReferenceMark } from '../../../../shared/schemas/sheets';

/**
 * A reference mark in the shape the markup canvas draws (it draws findings): the mark's own shape and points,
 * its reference as title, an informational marker numbered in list order.
 */
export function markAsFinding(mark: ReferenceMark, number: number): Finding {
  return {
    id: mark.id,
    photoId: mark.photoId ?? 0,
    restorationId: mark.restorationId,
    number,
    shape: mark.shape,
    points: mark.points,
    title: mark.ref,
    componentRef: mark.ref,
    kind: 'note',
    severity: 'info',
    status: 'observed',
    dismissReason: null,
    ownerVisible: false,
    authorId: null,
    authorName: null,
    questionOpen: false,
    commentCount: 0,
    createdAt: mark.createdAt,
    updatedAt: mark.createdAt,
  };
}

/** Where a mark is: the diagram page or chassis photo viewer, zoomed onto it. */
export const markPath = (restorationId: number, mark: Pick<ReferenceMark, 'id' | 'sheetPageId' | 'photoId'>) =>
  mark.sheetPageId !== null
    ? `/restorations/${restorationId}/sheets/${mark.sheetPageId}?mark=${mark.id}`
    : `/restorations/${restorationId}/sheets/chassis/${mark.photoId}?mark=${mark.id}`;
