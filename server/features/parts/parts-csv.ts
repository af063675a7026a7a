import { stringify } from 'csv-stringify/sync';
import { isoDate } from '../../format';
import { minorDigits } from '../../../shared/money';
import {
  mainsPositionLabels,
  partActionLabels,
  partStateLabels,
  type Part,
  type PartsCsvQuery,
} from '../../../shared/schemas/parts';

/** A ledger line for export, with the finding it answers when the reader may see that finding. */
export interface CsvLine {
  part: Part;
  finding: { number: number; title: string } | null;
}

/** Who reads the export: without `costs` (mentors see no money) the cost column is left out altogether. */
export interface CsvReader {
  costs: boolean;
}

function columns({ currency, timeZone }: PartsCsvQuery, reader: CsvReader) {
  const digits = currency ? minorDigits(currency) : 2;
  const all = [
    ['Reference', ({ part }: CsvLine) => part.componentRef],
    ['Finding', ({ finding }: CsvLine) => (finding ? `#${finding.number} ${finding.title}` : '')],
    ['Action', ({ part }: CsvLine) => partActionLabels[part.action]],
    ['State', ({ part }: CsvLine) => partStateLabels[part.state]],
    ['Original part', ({ part }: CsvLine) => part.originalPart],
    ['Original rating', ({ part }: CsvLine) => part.originalRating],
    ['Replacement part', ({ part }: CsvLine) => part.replacementPart],
    ['Replacement rating', ({ part }: CsvLine) => part.replacementRating],
    ['Mains position', ({ part }: CsvLine) => mainsPositionLabels[part.mainsPosition]],
    ['Quantity', ({ part }: CsvLine) => String(part.quantity)],
    [
      currency ? `Cost (${currency})` : 'Cost',
      ({ part }: CsvLine) => (part.costMinor === null ? '' : (part.costMinor / 10 ** digits).toFixed(digits)),
    ],
    ['Source', ({ part }: CsvLine) => part.source],
    ['Tested after', ({ part }: CsvLine) => part.testedAfter],
    ['Notes', ({ part }: CsvLine) => part.notes],
    ['Fitted', ({ part }: CsvLine) => (part.fittedAt ? isoDate(part.fittedAt, timeZone) : '')],
    ['Warnings', ({ part }: CsvLine) => part.warnings.map((w) => w.message).join(' | ')],
  ] as const;
  return reader.costs ? all : all.filter(([header]) => !header.startsWith('Cost'));
}

/**
 * A cell a spreadsheet would run as a formula (=, +, -, @, tab or carriage return first) gets a leading
 * single quote, which spreadsheets show as text, and every text cell is quoted: OWASP's CSV injection guidance.
 */
export function neutraliseFormula(cell: string): string {
  return /^[=+\-@\t\r]/.test(cell) ? `'${cell}` : cell;
}

/**
 * The ledger as CSV (RFC 4180 quoting by csv-stringify), with a byte-order mark so spreadsheets read UTF-8, in the
 * order given (the service gives parts-list order), dates as ISO 8601 dates and costs as plain numbers.
 */
export function partsCsv(lines: CsvLine[], options: PartsCsvQuery = {}, reader: CsvReader = { costs: true }): string {
  const cols = columns(options, reader);
  const rows = [cols.map(([h]) => h), ...lines.map((line) => cols.map(([, get]) => get(line)))];
  return stringify(
    rows.map((row) => row.map(neutraliseFormula)),
    { bom: true, record_delimiter: 'windows', quoted_string: true },
  );
}
