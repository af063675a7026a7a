/** Shown when the work on a finding means hands inside the chassis. */
export function FindingCaution() {
  return (
    <div role="note" className="rounded-lg border-l-4 border-glow bg-glow-soft px-3 py-2 text-sm text-ink">
      <span aria-hidden="true" className="font-semibold text-glow-strong">
        ⚠{' '}
      </span>
      <strong>Before touching the chassis:</strong> switch off, unplug, discharge the filter capacitors and verify with a meter;
      AC/DC sets may have a live chassis. Follow local codes and licensed practice.
    </div>
  );
}
