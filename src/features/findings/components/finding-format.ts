import type { Role } from '../../../../shared/permissions';
import {
  kindLabels,
  severityLabels,
  statusLabels,
  type Kind,
  type Severity,
  type Shape,
  type Status,
} from '../../../../shared/schemas/findings';
import { formatDateTime, relativeTime } from '../../../lib/format';

/** A member of the restoration as the panel and the thread need them: to name authors and offer @mentions. */
export interface FindingMember {
  userId: number;
  name: string;
  role: Role;
}

/** "just now", "5 minutes ago"; and the full date and time, for a tooltip beside a relative time. */
export { relativeTime, formatDateTime as fullTime };

const fieldNames: Record<string, string> = {
  title: 'Title',
  componentRef: 'Component',
  kind: 'Kind',
  severity: 'Severity',
  status: 'Status',
  dismissReason: 'Reason dismissed',
  shape: 'Shape',
};

const shapeLabels: Record<Shape, string> = {
  pin: 'Pin',
  circle: 'Circle',
  rect: 'Rectangle',
  arrow: 'Arrow',
  freehand: 'Freehand',
};

function inWords(field: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return 'none';
  const text = String(value);
  if (field === 'status') return statusLabels[text as Status] ?? text;
  if (field === 'kind') return kindLabels[text as Kind] ?? text;
  if (field === 'severity') return severityLabels[text as Severity] ?? text;
  if (field === 'shape') return shapeLabels[text as keyof typeof shapeLabels] ?? text;
  return typeof value === 'string' ? value : JSON.stringify(value);
}

/** One recorded change in words: "Status: Observed → Confirmed", "Shared with the owner", "Mark moved". */
export function describeChange(field: string, [before, after]: readonly [unknown, unknown]): string {
  if (field === 'points') return 'Mark moved or reshaped';
  if (field === 'ownerVisible') return after ? 'Shared with the owner' : 'No longer shared with the owner';
  if (field === 'questionOpen') return after ? 'Question asked of the mentors' : 'Question resolved';
  return `${fieldNames[field] ?? field}: ${inWords(field, before)} → ${inWords(field, after)}`;
}
