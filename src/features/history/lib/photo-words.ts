import { phaseLabels, viewLabels, type Photo } from '../../../../shared/schemas/photos';
import { formatMediumDate } from '../../../lib/format';

/** The day a photo was taken (or, failing the camera's word, uploaded): "24 Nov 2026". */
export function photoDay(photo: Pick<Photo, 'takenAt' | 'uploadedAt'>): string {
  // Pickers name photos the same way in every locale (British English, the product's own words).
  return formatMediumDate(photo.takenAt ?? photo.uploadedAt, 'en-GB');
}

/** Words for an image's alt text: "Top, before: as received". */
export function photoWords(photo: Pick<Photo, 'view' | 'phase' | 'caption'>): string {
  const base = `${viewLabels[photo.view]}, ${phaseLabels[photo.phase].toLowerCase()}`;
  return photo.caption ? `${base}: ${photo.caption}` : base;
}

/** One line in a photo picker: "After · 30 Nov 2026 · cabinet polished". */
export function photoChoiceLabel(photo: Photo): string {
  const caption = photo.caption.trim();
  const short = caption.length > 40 ? `${caption.slice(0, 39)}…` : caption;
  return [phaseLabels[photo.phase], photoDay(photo), short].filter(Boolean).join(' · ');
}
