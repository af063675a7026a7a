/** The caution wherever a reading is taken on a powered set or with a test voltage applied. */
export function LiveReadingsNote() {
  return (
    <div role="note" className="rounded-lg border-l-4 border-danger bg-danger-soft px-3 py-2 text-sm text-ink">
      <p>
        <strong className="text-danger">
          <span aria-hidden="true">⚠ </span>Live readings: HT can kill.
        </strong>{' '}
        One hand away, insulated probes, meter rated for the voltage; discharge capacitors before touching; AC/DC sets
        may have a live chassis — use an isolation transformer. Follow local codes and licensed practice.
      </p>
    </div>
  );
}
