/**
 * Shown when the work on a finding means hands inside the chassis. The workshop reads the bench routine; the
 * owner reads their own words: the set is for a competent person to open, not for them.
 */
export function FindingCaution({ audience = 'workshop' }: { audience?: 'workshop' | 'owner' }) {
  return (
    <div role="note" className="rounded-lg border-l-4 border-glow bg-glow-soft px-3 py-2 text-sm text-ink">
      <span aria-hidden="true" className="font-semibold text-glow-strong">
        ⚠{' '}
      </span>
      {audience === 'owner' ? (
        <>
          <strong>Lethal voltages inside:</strong> keep the back on and let only a competent person open it. Follow
          local electrical codes.
        </>
      ) : (
        <>
          <strong>Before touching the chassis:</strong> switch off, unplug, discharge the filter capacitors and verify
          with a meter; AC/DC sets may have a live chassis. Follow local codes and licensed practice.
        </>
      )}
    </div>
  );
}
