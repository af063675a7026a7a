/** The options of a select over one of the contract's lists (kinds, states, roles…), each shown in its words. */
export function LabelledOptions<T extends string>({
  values,
  labels,
}: {
  values: readonly T[];
  labels: Record<T, string>;
}) {
  return (
    <>
      {values.map((value) => (
        <option key={value} value={value}>
          {labels[value]}
        </option>
      ))}
    </>
  );
}
