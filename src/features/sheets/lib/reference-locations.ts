import type { Finding } from '../../../../shared/schemas/findings';
import type { ReferenceMark, SheetPage } from '../../../../shared/schemas/sheets';
import { refOf, type ReferenceView } from '../../../lib/reference-path';

/** Where a reference sits on the chassis: a location mark, or a finding that names it. */
export type ChassisLocation =
  | { kind: 'mark'; id: number; photoId: number; mark: ReferenceMark }
  | { kind: 'finding'; id: number; photoId: number; finding: Finding };

/** The canvas id of a chassis location: a mark's own id, a finding's id negated (they share one canvas). */
export const canvasId = (l: ChassisLocation) => (l.kind === 'mark' ? l.id : -l.id);

/** The diagram marks of a reference, circuit-diagram pages first, then in page order. */
export function diagramMarksOf(ref: string, marks: ReferenceMark[], pages: SheetPage[]): ReferenceMark[] {
  const rank = (m: ReferenceMark) => {
    const page = pages.find((p) => p.id === m.sheetPageId);
    return page
      ? (page.kind === 'circuit-diagram' ? 0 : 1) * 1e9 + page.id * 1e3 + page.pageNumber
      : Number.MAX_SAFE_INTEGER;
  };
  return marks
    .filter((m) => m.ref === ref && m.sheetPageId !== null && pages.some((p) => p.id === m.sheetPageId))
    .sort((a, b) => rank(a) - rank(b));
}

/** Every place the reference is shown on a chassis photo the reader may see: location marks first, then findings. */
export function chassisLocationsOf(
  ref: string,
  marks: ReferenceMark[],
  findings: Finding[],
  photoIds: Set<number>,
): ChassisLocation[] {
  const fromMarks = marks
    .filter((m) => m.ref === ref && m.photoId !== null && photoIds.has(m.photoId))
    .map((m): ChassisLocation => ({ kind: 'mark', id: m.id, photoId: m.photoId!, mark: m }));
  const fromFindings = findings
    .filter((f) => refOf(f.componentRef) === ref && photoIds.has(f.photoId))
    .map((f): ChassisLocation => ({ kind: 'finding', id: f.id, photoId: f.photoId, finding: f }));
  return [...fromMarks, ...fromFindings];
}

/** The locations the view asked for, or the first of each. */
export function chosen(view: ReferenceView, diagram: ReferenceMark[], chassis: ChassisLocation[]) {
  return {
    diagram: diagram.find((m) => m.id === view.diagram) ?? diagram[0],
    chassis: chassis.find((l) => (l.kind === 'mark' ? l.id === view.chassis : l.id === view.finding)) ?? chassis[0],
  };
}
