import { stringify } from 'csv-stringify/sync';
import { mainsPositionLabels, partActionLabels, partStateLabels, type Part } from '../../../shared/schemas/parts';

const columns = [
  ['Reference', (p: Part) => p.componentRef],
  ['Action', (p: Part) => partActionLabels[p.action]],
  ['State', (p: Part) => partStateLabels[p.state]],
  ['Original part', (p: Part) => p.originalPart],
  ['Original rating', (p: Part) => p.originalRating],
  ['Replacement part', (p: Part) => p.replacementPart],
  ['Replacement rating', (p: Part) => p.replacementRating],
  ['Mains position', (p: Part) => mainsPositionLabels[p.mainsPosition]],
  ['Quantity', (p: Part) => String(p.quantity)],
  ['Cost', (p: Part) => (p.costMinor === null ? '' : (p.costMinor / 100).toFixed(2))],
  ['Source', (p: Part) => p.source],
  ['Tested after', (p: Part) => p.testedAfter],
  ['Notes', (p: Part) => p.notes],
  ['Fitted', (p: Part) => p.fittedAt ?? ''],
  ['Warnings', (p: Part) => p.warnings.map((w) => w.message).join(' | ')],
] as const;

/**
 * A cell a spreadsheet would run as a formula (=, +, -, @, tab or carriage return first) gets a leading
 * single quote, which spreadsheets show as text, and every text cell is quoted: OWASP's CSV injection guidance.
 */
export function neutraliseFormula(cell: string): string {
  return /^[=+\-@\t\r]/.test(cell) ? `'${cell}` : cell;
}

/** The ledger as CSV (RFC 4180 quoting by csv-stringify), with a byte-order mark so spreadsheets read UTF-8. */
export function partsCsv(list: Part[]): string {
  const rows = [columns.map(([h]) => h), ...list.map((p) => columns.map(([, get]) => get(p)))];
  return stringify(rows.map((row) => row.map(neutraliseFormula)), { bom: true, record_delimiter: 'windows', quoted_string: true });
}
