/**
 * Shown prominently whenever the line-up, or the restoration's own flag, says the chassis may be live.
 * `announce` makes it an alert, for when it appears while a line-up is being typed. An owner reads their own words.
 */
export function LiveChassisCaution({
  reasons = [],
  announce = false,
  audience = 'workshop',
}: {
  reasons?: string[];
  announce?: boolean;
  audience?: 'workshop' | 'owner';
}) {
  if (audience === 'owner')
    return (
      <p role="note" className="rounded-xl border-2 border-danger bg-danger-soft px-4 py-3 text-ink">
        <strong className="text-danger">
          <span aria-hidden="true">⚠ </span>This set may have a live chassis:
        </strong>{' '}
        its metal frame can be connected to the mains. Use it only with its back and every knob in place, and let only a
        competent person open it. Follow local electrical codes.
      </p>
    );
  return (
    <div
      role={announce ? 'alert' : 'note'}
      className="space-y-1 rounded-xl border-2 border-danger bg-danger-soft px-4 py-3 text-ink"
    >
      <p>
        <strong className="text-lg text-danger">
          <span aria-hidden="true">⚠ </span>Live chassis likely:
        </strong>{' '}
        series heaters mean the chassis may be connected to the mains. Work only through an isolation transformer; treat
        every metal part as live; refit insulating knobs and covers. Follow local codes and licensed practice.
      </p>
      {reasons.length > 0 && (
        <ul className="list-disc pl-5 text-sm">
          {reasons.map((r) => (
            <li key={r}>{r}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
