const collator = new Intl.Collator('en', { numeric: true, sensitivity: 'base' });

/** Text with numbers read as numbers, case ignored: "V3 pin 9" before "V3 pin 10", "V2" before "V10". */
export const naturalCompare = (a: string, b: string): number => collator.compare(a, b);

/**
 * Component references in the order a schematic's parts list gives them: letters first, then the number as a
 * number (C2 before C14), then any suffix (R1 before R1A before R1B); case does not matter. A line without a
 * reference goes last. The one order used by the tables, the CSV export and the report.
 */
export function compareComponentRefs(a: string, b: string): number {
  const x = a.trim();
  const y = b.trim();
  if (x === '' || y === '') return (x === '' ? 1 : 0) - (y === '' ? 1 : 0);
  return naturalCompare(x, y);
}

/** The same reference however it was typed: "c27 " and "C27" are one part. */
export const sameComponentRef = (a: string, b: string): boolean =>
  a.trim() !== '' && a.trim().toUpperCase() === b.trim().toUpperCase();

/**
 * The first row (lowest id: the one recorded first) that already carries `ref`, other than `exceptId` (the row
 * being edited). Used to point out a second finding or ledger line for the same part.
 */
export function firstWithComponentRef<T extends { id: number; componentRef: string }>(
  rows: readonly T[],
  ref: string,
  exceptId?: number,
): T | undefined {
  let first: T | undefined;
  for (const row of rows)
    if (row.id !== exceptId && sameComponentRef(row.componentRef, ref) && (!first || row.id < first.id)) first = row;
  return first;
}
