import { inputClass } from '../../../components/field';

/** What a stretch of labour says of itself, in the timer and in a logged entry alike: a note, and whether it is billed. */
export function LabourNoteFields({
  noteId,
  note,
  onNote,
  billable,
  onBillable,
}: {
  noteId: string;
  note: string;
  onNote: (note: string) => void;
  billable: boolean;
  onBillable: (billable: boolean) => void;
}) {
  return (
    <>
      <div className="space-y-1">
        <label htmlFor={noteId} className="block font-semibold">
          Note
        </label>
        <input
          id={noteId}
          className={inputClass}
          value={note}
          maxLength={500}
          onChange={(e) => onNote(e.target.value)}
        />
      </div>
      <label className="flex min-h-11 items-center gap-2">
        <input type="checkbox" checked={billable} onChange={(e) => onBillable(e.target.checked)} /> Billable
      </label>
    </>
  );
}
