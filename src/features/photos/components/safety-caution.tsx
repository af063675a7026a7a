/** The caution shown where photographing starts: photos come before any power, and a powered set bites. */
export function SafetyCaution({ liveChassis = false }: { liveChassis?: boolean }) {
  return (
    <div role="note" className="space-y-1 rounded-lg border-l-4 border-glow bg-glow-soft px-3 py-2 text-sm text-ink">
      <p>
        <span aria-hidden="true" className="font-semibold text-glow-strong">
          ⚠{' '}
        </span>
        <strong>Photograph before any power.</strong> If the set has been powered, discharge the filter capacitors and
        verify with a meter before reaching in; on AC/DC sets the chassis may be live. Follow local electrical codes and
        licensed practice.
      </p>
      {liveChassis && (
        <p className="font-semibold">
          This set is marked live-chassis: work through an isolation transformer and keep one hand away.
        </p>
      )}
    </div>
  );
}
