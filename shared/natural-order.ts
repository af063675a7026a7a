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
