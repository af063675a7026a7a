import { phaseLabels, viewLabels, type Photo } from '../../../../shared/schemas/photos';

/**
 * Names each photo the way the filters and the table show it: "Underside · before". Where two photos would read
 * the same, the caption tells them apart, and failing that a number.
 */
export function photoLabels(photos: Photo[]): { id: number; label: string }[] {
  const base = (p: Photo) => `${viewLabels[p.view]} · ${phaseLabels[p.phase].toLowerCase()}`;
  const counts = new Map<string, number>();
  for (const p of photos) counts.set(base(p), (counts.get(base(p)) ?? 0) + 1);
  const seen = new Map<string, number>();
  return photos.map((p) => {
    const label = base(p);
    if ((counts.get(label) ?? 0) < 2) return { id: p.id, label };
    const n = (seen.get(label) ?? 0) + 1;
    seen.set(label, n);
    const caption = p.caption.trim();
    return {
      id: p.id,
      label: caption ? `${label} · ${caption.length > 32 ? `${caption.slice(0, 31)}…` : caption}` : `${label} ${n}`,
    };
  });
}
