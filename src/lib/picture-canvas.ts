import type { Finding } from '../../shared/schemas/findings';

/**
 * What a picture canvas is given, whoever shows it: the markup canvas takes these (and its own extras); the sheets'
 * reference views ask for a canvas with them through the app layer (`SheetCanvasProvider`).
 */
export interface PictureCanvasProps {
  imageUrl: string;
  /** The upright picture's size in px: image space. */
  imageSize: { width: number; height: number };
  items: readonly Finding[];
  selectedId?: number;
  /** Zoom onto this finding when it is set (opening a finding's URL, picking it from a list). */
  focusId?: number;
  /** A reader's canvas (no tools) zooms onto `focusId` too, as the reference view does; otherwise it stays at Fit. */
  focusWhenReading?: boolean;
  canCreate: boolean;
  canEdit: (finding: Finding) => boolean;
  onSelect: (id: number | undefined) => void;
  /** The display image failed to load (its presigned URL may have expired). */
  onImageError?: () => void;
  /** Names the picture for screen readers. */
  label?: string;
}
