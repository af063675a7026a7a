import type { Finding } from '../../../../shared/schemas/findings';
import type { Photo } from '../../../../shared/schemas/photos';
import { stageLabels, type Restoration, type Stage } from '../../../../shared/schemas/restorations';
import { hourIn } from '../../../lib/format';

/** Where the set is, in the owner's words: "With the workshop: repair", or "Ready to collect" once returned. */
export function stageInWords(stage: Stage): string {
  return stage === 'returned' ? 'Ready to collect' : `With the workshop: ${stageLabels[stage].toLowerCase()}`;
}

/** The set as its owner knows it: "Aldermoor Cantata" (the year is shown beside it). */
export const setName = (r: Pick<Restoration, 'make' | 'model'>) => `${r.make} ${r.model}`.trim();

/** "Good morning, Mara": the first name, and the part of the day on the reader's own clock (their time zone). */
export function greeting(name: string | null | undefined, now = new Date(), timeZone?: string): string {
  const hour = hourIn(now, timeZone);
  const part = hour < 5 ? 'Good evening' : hour < 12 ? 'Good morning' : hour < 18 ? 'Good afternoon' : 'Good evening';
  const first = name?.trim().split(/\s+/)[0];
  return first ? `${part}, ${first}` : part;
}

const shotAt = (p: Photo) => {
  const t = Date.parse(p.takenAt ?? p.uploadedAt);
  return Number.isNaN(t) ? 0 : t;
};
const newest = (photos: Photo[]) =>
  photos.reduce<Photo | undefined>(
    (best, p) => (!best || shotAt(p) > shotAt(best) || (shotAt(p) === shotAt(best) && p.id > best.id) ? p : best),
    undefined,
  );

/**
 * The photo at the top of the set's page: the latest shared "after" photo, else the latest shared photo of any
 * phase. Owners receive only shared photos; the check stays so nothing unshared can reach this page.
 */
export function heroPhoto(photos: Photo[]): Photo | undefined {
  const shared = photos.filter((p) => p.ownerVisible);
  return newest(shared.filter((p) => p.phase === 'after')) ?? newest(shared);
}

/** Findings whose repair is done (repaired, or repaired and checked), in the order they were numbered. */
export function repairedFindings(findings: Finding[]): Finding[] {
  return findings.filter((f) => f.status === 'repaired' || f.status === 'verified').sort((a, b) => a.number - b.number);
}

/** The hand-back report, served by the API as a PDF download. */
export const reportUrl = (restorationId: number) => `/api/restorations/${restorationId}/report.pdf`;
