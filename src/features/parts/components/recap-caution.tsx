/** Shown while a capacitor is being replaced: the cautions a restorer repeats before every recap. */
export function RecapCaution() {
  return (
    <p role="note" className="rounded-xl border-2 border-danger bg-danger-soft px-4 py-3 text-sm text-ink">
      <strong className="text-danger">
        <span aria-hidden="true">⚠ </span>Before you unsolder:
      </strong>{' '}
      Discharge the filter capacitors and verify with a meter before unsoldering; never lower a voltage rating; use
      X/Y-class safety capacitors where the mains connects. Follow local codes and licensed practice.
    </p>
  );
}
