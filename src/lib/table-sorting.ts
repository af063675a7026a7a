import type { Row } from '@tanstack/react-table';
import { compareComponentRefs } from '../../shared/natural-order';

/** TanStack Table's sortingFn for a column of component references: the project's one natural order. */
export const byComponentRef = <T>(a: Row<T>, b: Row<T>, id: string): number =>
  compareComponentRefs(a.getValue<string>(id), b.getValue<string>(id));
