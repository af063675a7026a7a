/** A finding as the parts feature needs it: to link a part to it, and to show the link as "#n". */
export interface FindingChoice {
  id: number;
  number: number;
  title: string;
}
