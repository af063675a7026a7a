/** A finding a reading, a ledger line, an intake item or a power-up step can be tied to. */
export interface FindingChoice {
  id: number;
  number: number;
  title: string;
}

/** The options of a "Finding" select: none (the empty value), then each finding as "#n title". */
export function FindingOptions({
  findings,
  none = 'Not tied to a finding',
}: {
  findings: readonly FindingChoice[];
  none?: string;
}) {
  return (
    <>
      <option value="">{none}</option>
      {findings.map((f) => (
        <option key={f.id} value={String(f.id)}>
          #{f.number} {f.title}
        </option>
      ))}
    </>
  );
}
