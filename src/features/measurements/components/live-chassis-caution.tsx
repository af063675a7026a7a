/**
 * Shown prominently whenever the line-up, or the restoration's own flag, says the chassis may be live.
 * `announce` makes it an alert, for when it appears while a line-up is being typed.
 */
export function LiveChassisCaution({ reasons = [], announce = false }: { reasons?: string[]; announce?: boolean }) {
  return (
    <div role={announce ? 'alert' : 'note'} className="space-y-1 rounded-xl border-2 border-danger bg-danger-soft px-4 py-3 text-ink">
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
