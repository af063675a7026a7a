import type { ReactNode } from 'react';
import { firstWithComponentRef } from '../../shared/natural-order';

/** What an "already named" notice is given: the reference being typed, and the row being edited (not counted). */
export interface SameReferenceProps {
  restorationId: number;
  componentRef: string;
  exceptId?: number;
}

/**
 * The one rule for "this reference is already named": shows `children(first)` for the first other row recorded that
 * names the reference; nothing until the rows are here. It never stops a second row (a part replaced twice, a part
 * with two faults).
 */
export function SameReferenceNotice<T extends { id: number; componentRef: string }>({
  rows,
  componentRef,
  exceptId,
  children,
}: Omit<SameReferenceProps, 'restorationId'> & { rows: readonly T[] | undefined; children: (first: T) => ReactNode }) {
  const first = rows ? firstWithComponentRef(rows, componentRef, exceptId) : undefined;
  return first ? <>{children(first)}</> : null;
}
