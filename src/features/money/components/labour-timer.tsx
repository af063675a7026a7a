import { useEffect, useId, useState } from 'react';
import { Link } from 'react-router';
import type { LabourLog } from '../../../../shared/schemas/labour';
import { Button } from '../../../components/button';
import { useStartTimer, useStopTimer } from '../api/labour';
import { clockText, LabourTargetSelect, targetOf, type TargetValue } from './labour-target';
import { formatTimeOfDay } from '../../../lib/format';
import { LabourNoteFields } from './labour-note-fields';

/** Seconds since an instant, ticking once a second while shown. */
function useElapsed(since: string | null): number {
  const [now, setNow] = useState(() => Date.now());
  useEffect(() => {
    if (!since) return;
    const timer = setInterval(() => setNow(Date.now()), 1000);
    return () => clearInterval(timer);
  }, [since]);
  return since ? (now - Date.parse(since)) / 1000 : 0;
}

/**
 * The reader's start/stop timer. Its start is stored on the server, so a reload, another tab or the phone on the
 * bench shows the same running clock; stopping writes the minutes to the log.
 */
export function LabourTimer({ restorationId, running }: { restorationId: number; running: LabourLog['running'] }) {
  const [target, setTarget] = useState<TargetValue>('stage:repair');
  const [note, setNote] = useState('');
  const [billable, setBillable] = useState(true);
  const start = useStartTimer(restorationId);
  const stop = useStopTimer(restorationId);
  const elapsed = useElapsed(running?.startedAt ?? null);
  const targetId = useId();
  const noteId = useId();
  const error = start.error ?? stop.error;

  if (running && running.restorationId !== restorationId)
    return (
      <p className="rounded-lg bg-sunken p-3">
        Your timer is running on another set since {formatTimeOfDay(running.startedAt)}.{' '}
        <Link className="font-semibold underline" to={`/restorations/${running.restorationId}/money`}>
          Go to it to stop it
        </Link>
        .
      </p>
    );
  if (running)
    return (
      <div className="flex flex-wrap items-center gap-3 rounded-lg border border-glow bg-sunken p-3">
        <p role="timer" aria-label="Time on the running timer" className="font-mono text-2xl">
          {clockText(elapsed)}
        </p>
        <p className="text-sm text-ink-soft">
          Running since {formatTimeOfDay(running.startedAt)}
          {running.billable ? '' : ' (not billable)'}
          {running.note ? `: ${running.note}` : ''}
        </p>
        <Button onClick={() => stop.mutate(undefined)} disabled={stop.isPending}>
          {stop.isPending ? 'Stopping…' : 'Stop the timer'}
        </Button>
        {error && (
          <p role="alert" className="w-full font-semibold text-danger">
            {error.message}
          </p>
        )}
      </div>
    );
  return (
    <form
      className="grid gap-3 rounded-lg bg-sunken p-3 sm:grid-cols-[12rem_1fr_auto_auto] sm:items-end"
      aria-label="Start a timer"
      onSubmit={(e) => {
        e.preventDefault();
        start.mutate({ ...targetOf(target), note: note.trim(), billable });
      }}
    >
      <div className="space-y-1">
        <label htmlFor={targetId} className="block font-semibold">
          For
        </label>
        <LabourTargetSelect restorationId={restorationId} id={targetId} value={target} onChange={setTarget} />
      </div>
      <LabourNoteFields noteId={noteId} note={note} onNote={setNote} billable={billable} onBillable={setBillable} />
      <Button type="submit" disabled={start.isPending}>
        {start.isPending ? 'Starting…' : 'Start the timer'}
      </Button>
      {error && (
        <p role="alert" className="font-semibold text-danger sm:col-span-4">
          {error.message}
        </p>
      )}
    </form>
  );
}
