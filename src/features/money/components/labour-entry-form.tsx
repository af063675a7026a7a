import { useId, useState } from 'react';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { useAddLabour } from '../api/labour';
import { LabourTargetSelect, targetOf, type TargetValue } from './labour-target';
import { calendarDay } from '../../../lib/format';
import { LabourNoteFields } from './labour-note-fields';

/** Hours as typed ("1.5", "0.25", "2") to whole minutes; null when it is no number of hours in a day. */
export const typedMinutes = (text: string) => {
  if (!/^\d+(\.\d+)?$/.test(text.trim())) return null;
  const minutes = Math.round(Number(text.trim()) * 60);
  return minutes >= 1 && minutes <= 24 * 60 ? minutes : null;
};

/** Today on the reader's calendar, as a date input writes it. */
const today = () => calendarDay(new Date());

/** Typed hours on a day (noon on that day in the reader's zone), for work done away from the timer. */
export function LabourEntryForm({ restorationId }: { restorationId: number }) {
  const [hours, setHours] = useState('');
  const [day, setDay] = useState(today);
  const [target, setTarget] = useState<TargetValue>('stage:repair');
  const [note, setNote] = useState('');
  const [billable, setBillable] = useState(true);
  const [invalid, setInvalid] = useState(false);
  const add = useAddLabour(restorationId);
  const ids = { hours: useId(), day: useId(), target: useId(), note: useId() };
  const submit = () => {
    const minutes = typedMinutes(hours);
    if (minutes === null) return setInvalid(true);
    const workedAt = new Date(`${day}T12:00:00`).toISOString();
    add.mutate(
      { ...targetOf(target), note: note.trim(), billable, minutes, workedAt },
      {
        onSuccess: () => {
          setHours('');
          setNote('');
        },
      },
    );
  };
  return (
    <form
      className="grid gap-3 rounded-lg bg-sunken p-3 sm:grid-cols-[6rem_10rem_12rem_1fr] sm:items-end"
      aria-label="Add typed hours"
      onSubmit={(e) => {
        e.preventDefault();
        submit();
      }}
    >
      <div className="space-y-1">
        <label htmlFor={ids.hours} className="block font-semibold">
          Hours
        </label>
        <input
          id={ids.hours}
          inputMode="decimal"
          className={inputClass}
          value={hours}
          placeholder="1.5"
          aria-invalid={invalid}
          aria-describedby={invalid ? `${ids.hours}-error` : undefined}
          onChange={(e) => {
            setHours(e.target.value);
            setInvalid(false);
          }}
        />
      </div>
      <div className="space-y-1">
        <label htmlFor={ids.day} className="block font-semibold">
          Day
        </label>
        <input
          id={ids.day}
          type="date"
          className={inputClass}
          value={day}
          max={today()}
          onChange={(e) => setDay(e.target.value)}
        />
      </div>
      <div className="space-y-1">
        <label htmlFor={ids.target} className="block font-semibold">
          For
        </label>
        <LabourTargetSelect restorationId={restorationId} id={ids.target} value={target} onChange={setTarget} />
      </div>
      <LabourNoteFields noteId={ids.note} note={note} onNote={setNote} billable={billable} onBillable={setBillable} />
      <Button type="submit" disabled={add.isPending} className="sm:col-start-4 sm:justify-self-start">
        {add.isPending ? 'Adding…' : 'Add the hours'}
      </Button>
      {invalid && (
        <p id={`${ids.hours}-error`} role="alert" className="font-semibold text-danger sm:col-span-4">
          Type the hours as a number, e.g. 1.5 (up to 24).
        </p>
      )}
      {add.isError && (
        <p role="alert" className="font-semibold text-danger sm:col-span-4">
          {add.error.message}
        </p>
      )}
    </form>
  );
}
