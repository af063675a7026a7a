import { parse } from 'csv-parse/sync';
import { describe, expect, it } from 'vitest';
import type { Part } from '../../../shared/schemas/parts';
import { isoDate } from '../../format';
import { neutraliseFormula, partsCsv } from './parts-csv';

describe('CSV formula neutralising', () => {
  // OWASP, "CSV Injection": cells beginning with =, +, -, @, tab (0x09) or carriage return (0x0D) are
  // prefixed with a single quote so a spreadsheet shows them as text instead of evaluating them.
  it.each(['=1+1', '+1 555 0100', '-2+3', '@SUM(A1:A2)', '\t=1+1', '\r=1+1', '=HYPERLINK("http://x.test","y")'])(
    'when a cell is %j, then it gets a leading quote',
    (cell) => expect(neutraliseFormula(cell)).toBe(`'${cell}`),
  );

  it.each(['C30', '47µF 450V', 'Film 0.047µF 630V', '', ' =not first', "'already quoted", '1.85'])(
    'when a cell is %j, then it is left alone',
    (cell) => expect(neutraliseFormula(cell)).toBe(cell),
  );

  it('when the ledger is exported, then every cell goes through it and the file still parses', () => {
    const part = {
      id: 1,
      restorationId: 1,
      findingId: null,
      componentRef: 'R1',
      action: 'replaced',
      state: 'fitted',
      originalPart: '=cmd|calc',
      originalRating: '',
      replacementPart: '',
      replacementRating: '',
      mainsPosition: 'none',
      quantity: 1,
      costMinor: null,
      source: '@evil',
      testedAfter: '',
      notes: '\tnote',
      fittedAt: null,
      warnings: [],
    } as unknown as Part;
    const [row] = parse(partsCsv([{ part, finding: null }]), { bom: true, columns: true }) as Record<string, string>[];
    expect(row!['Original part']).toBe("'=cmd|calc");
    expect(row!.Source).toBe("'@evil");
    expect(row!.Notes).toBe("'\tnote");
  });
});

describe('CSV cost column', () => {
  it('when the reader may not see money, then the file has no cost column; otherwise it has one in the currency', () => {
    const part = {
      id: 1,
      restorationId: 1,
      findingId: null,
      componentRef: 'C7',
      action: 'replaced',
      state: 'fitted',
      originalPart: 'Wax paper',
      originalRating: '',
      replacementPart: 'Film',
      replacementRating: '',
      mainsPosition: 'none',
      quantity: 1,
      costMinor: 385,
      source: '',
      testedAfter: '',
      notes: '',
      fittedAt: null,
      warnings: [],
    } as unknown as Part;
    const header = (text: string) => (parse(text, { bom: true, to: 1 }) as string[][])[0]!;
    expect(header(partsCsv([{ part, finding: null }], { currency: 'GBP' }))).toContain('Cost (GBP)');
    const hidden = partsCsv([{ part, finding: null }], { currency: 'GBP' }, { costs: false });
    expect(header(hidden).some((h) => h.startsWith('Cost'))).toBe(false);
    expect(hidden).not.toContain('3.85');
  });
});

describe('CSV dates', () => {
  // Offsets from the IANA tz database: Europe/Berlin is UTC+1 in winter, America/New_York UTC-5 (EST) before
  // 8 March 2026 and UTC-4 from then; Pacific/Auckland UTC+13 in January (NZDT).
  it.each([
    ['2026-01-15T12:00:00Z', 'UTC', '2026-01-15'],
    ['2026-01-15T23:30:00Z', 'Europe/Berlin', '2026-01-16'],
    ['2026-03-08T03:30:00Z', 'America/New_York', '2026-03-07'],
    ['2026-01-15T11:30:00Z', 'Pacific/Auckland', '2026-01-16'],
  ])('when %s is written for a reader in %s, then the ISO 8601 date is %s', (instant, zone, date) => {
    expect(isoDate(instant, zone)).toBe(date);
  });
});
