import type { Role } from '../../../../shared/permissions';
import { kindLabels, severityLabels, statusLabels, type Kind, type Severity, type Shape, type Status } from '../../../../shared/schemas/findings';

/** A member of the restoration as the panel and the thread need them: to name authors and offer @mentions. */
export interface FindingMember {
  userId: number;
  name: string;
  role: Role;
}

const relative = new Intl.RelativeTimeFormat('en', { numeric: 'auto' });
/** Each unit and how many of it make the next one up. */
const steps: [Intl.RelativeTimeFormatUnit, number][] = [
  ['second', 60],
  ['minute', 60],
  ['hour', 24],
  ['day', 7],
  ['week', 4.345],
  ['month', 12],
  ['year', Number.POSITIVE_INFINITY],
];

/** "just now", "5 minutes ago", "yesterday", "3 weeks ago": when something happened, read at a glance. */
export function relativeTime(iso: string, now: number = Date.now()): string {
  const then = Date.parse(iso);
  if (Number.isNaN(then)) return '';
  let value = (then - now) / 1000;
  if (Math.abs(value) < 45) return 'just now';
  for (const [unit, size] of steps) {
    if (Math.abs(value) < size) return relative.format(Math.round(value), unit);
    value /= size;
  }
  return '';
}

/** The full date and time, for a tooltip beside a relative time. */
export function fullTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? '' : date.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}


const fieldNames: Record<string, string> = {
  title: 'Title',
  componentRef: 'Component',
  kind: 'Kind',
  severity: 'Severity',
  status: 'Status',
  dismissReason: 'Reason dismissed',
  shape: 'Shape',
};

const shapeLabels: Record<Shape, string> = { pin: 'Pin', circle: 'Circle', rect: 'Rectangle', arrow: 'Arrow', freehand: 'Freehand' };

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
