/** Which picture to open on each side, and which comes first on a phone. */
export interface ReferenceView {
  /** A diagram mark to zoom onto. */
  diagram?: number;
  /** A chassis location mark to zoom onto. */
  chassis?: number;
  /** A finding on a chassis photo to zoom onto. */
  finding?: number;
  /** What was asked for: shown first when the two pictures are one after the other. */
  first?: 'diagram' | 'chassis';
}

/** The reference's view: the diagram and the chassis side by side, zoomed onto the part. */
export function referencePath(restorationId: number, ref: string, view: ReferenceView = {}): string {
  const q = new URLSearchParams();
  for (const [k, v] of Object.entries(view)) if (v !== undefined) q.set(k, String(v));
  const query = q.toString();
  return `/restorations/${restorationId}/references/${encodeURIComponent(ref.toUpperCase())}${query ? `?${query}` : ''}`;
}

/** The reference a typed text names: its first word, upper-cased, when it reads like R23, VR2 or S1a ("V5 pin 3" → V5). */
export function refOf(text: string): string | undefined {
  return /^([A-Za-z]{1,4}[0-9]{1,5}[A-Za-z]?)(\s|$)/.exec(text.trim())?.[1]?.toUpperCase();
}
