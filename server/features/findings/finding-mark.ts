import type { findings } from '../../db/schema';

type FindingFields = Pick<
  typeof findings.$inferSelect,
  'id' | 'number' | 'shape' | 'points' | 'title' | 'componentRef' | 'kind' | 'severity' | 'status'
>;

/** What every view of a finding draws: its mark on the photo and its label (the finding route and a help request's pins). */
export const findingMark = (f: FindingFields) => ({
  id: f.id,
  number: f.number,
  shape: f.shape,
  points: f.points,
  title: f.title,
  componentRef: f.componentRef,
  kind: f.kind,
  severity: f.severity,
  status: f.status,
});
