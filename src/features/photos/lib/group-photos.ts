import { phases, views, type Phase, type Photo, type View } from '../../../../shared/schemas/photos';

export interface PhaseGroup {
  phase: Phase;
  photos: Photo[];
}
export interface ViewGroup {
  view: View;
  count: number;
  phases: PhaseGroup[];
}

const when = (p: Photo) => p.takenAt ?? p.uploadedAt;

/**
 * The gallery's order: views as the schema lists them (top, underside, rear…), then before → during → after,
 * then oldest first. Empty views and phases are left out.
 */
export function groupPhotos(photos: readonly Photo[]): ViewGroup[] {
  const sorted = [...photos].sort((a, b) => when(a).localeCompare(when(b)) || a.id - b.id);
  return views.flatMap((view) => {
    const inView = sorted.filter((p) => p.view === view);
    if (!inView.length) return [];
    const byPhase = phases
      .map((phase) => ({ phase, photos: inView.filter((p) => p.phase === phase) }))
      .filter((g) => g.photos.length > 0);
    return [{ view, count: inView.length, phases: byPhase }];
  });
}

/** The same photos in one line, for the lightbox's previous/next. */
export const flattenGroups = (groups: readonly ViewGroup[]): Photo[] =>
  groups.flatMap((v) => v.phases.flatMap((p) => p.photos));
