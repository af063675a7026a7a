import { describe, expect, it } from 'vitest';
import type { Finding } from '../../../../shared/schemas/findings';
import type { ReferenceMark, SheetPage } from '../../../../shared/schemas/sheets';
import { canvasId, chassisLocationsOf, chosen, diagramMarksOf } from './reference-locations';
import { referencePath, refOf } from '../../../lib/reference-path';

const mark = (id: number, ref: string, on: { sheetPageId?: number; photoId?: number }): ReferenceMark => ({
  id,
  restorationId: 1,
  sheetPageId: on.sheetPageId ?? null,
  photoId: on.photoId ?? null,
  ref,
  shape: 'pin',
  points: [{ x: 0.5, y: 0.5 }],
  createdAt: '2026-12-02T09:00:00.000Z',
});
const page = (id: number, kind: SheetPage['kind']) => ({ id, kind, pageNumber: 1 }) as SheetPage;
const finding = (id: number, photoId: number, componentRef: string) => ({ id, photoId, componentRef }) as Finding;

describe('where a reference is shown', () => {
  it('when R23 is marked on a layout page and a circuit diagram page, then the circuit diagram comes first', () => {
    const marks = [
      mark(1, 'R23', { sheetPageId: 10 }),
      mark(2, 'R23', { sheetPageId: 11 }),
      mark(3, 'C14', { sheetPageId: 11 }),
    ];
    expect(diagramMarksOf('R23', marks, [page(10, 'layout'), page(11, 'circuit-diagram')]).map((m) => m.id)).toEqual([
      2, 1,
    ]);
  });

  it('when a page is not among those the reader sees, then its marks are left out', () => {
    expect(diagramMarksOf('R23', [mark(1, 'R23', { sheetPageId: 99 })], [page(10, 'layout')])).toEqual([]);
  });

  it('when R23 has a location mark and a finding naming "R23 body", then both are chassis locations, marks first, on visible photos only', () => {
    const locations = chassisLocationsOf(
      'R23',
      [mark(5, 'R23', { photoId: 7 }), mark(6, 'R23', { photoId: 8 })],
      [finding(4, 7, 'r23 body'), finding(9, 7, 'R230')],
      new Set([7]),
    );
    expect(locations.map((l) => [l.kind, l.id, canvasId(l)])).toEqual([
      ['mark', 5, 5],
      ['finding', 4, -4],
    ]);
  });

  it('when the view names a finding, then that finding is chosen; otherwise the first of each', () => {
    const diagram = [mark(1, 'R23', { sheetPageId: 10 })];
    const chassis = chassisLocationsOf('R23', [mark(5, 'R23', { photoId: 7 })], [finding(4, 7, 'R23')], new Set([7]));
    expect(chosen({ finding: 4 }, diagram, chassis).chassis?.id).toBe(4);
    expect(chosen({}, diagram, chassis)).toMatchObject({ diagram: { id: 1 }, chassis: { kind: 'mark', id: 5 } });
  });

  it('when a text is read for its reference, then its first word counts, upper-cased ("V5 pin 3" → V5)', () => {
    expect(['V5 pin 3', 'r23', ' C14 ', 'HT line', 'R23-4'].map(refOf)).toEqual([
      'V5',
      'R23',
      'C14',
      undefined,
      undefined,
    ]);
  });

  it('when a path is built, then the reference is upper-cased and only the chosen pictures are in the query', () => {
    expect(referencePath(3, 'r23', { finding: 4, first: 'diagram' })).toBe(
      '/restorations/3/references/R23?finding=4&first=diagram',
    );
    expect(referencePath(3, 'C14')).toBe('/restorations/3/references/C14');
  });
});
