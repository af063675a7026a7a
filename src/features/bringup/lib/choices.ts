/** One of the restoration's own photos, for an intake item's photo slot. */
export interface PhotoChoice {
  id: number;
  label: string;
  thumbUrl: string;
}
