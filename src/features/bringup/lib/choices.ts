/** A finding the intake or a power-up step can link to. */
export interface FindingChoice {
  id: number;
  number: number;
  title: string;
}

/** One of the restoration's own photos, for an intake item's photo slot. */
export interface PhotoChoice {
  id: number;
  label: string;
  thumbUrl: string;
}
