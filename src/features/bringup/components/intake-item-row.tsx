import { useState } from 'react';
import { intakeItemWords, type Bringup, type IntakeCheckInput } from '../../../../shared/schemas/bringup';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';
import type { PhotoChoice } from '../lib/choices';
import { FindingOptions, type FindingChoice } from '../../../components/finding-options';

type Item = Bringup['intake'][number];

export interface IntakeItemRowProps {
  value: Item;
  findings: FindingChoice[];
  photos: PhotoChoice[];
  saving: boolean;
  error?: string;
  onSave: (input: IntakeCheckInput) => void;
}

/** One intake item: a tick that saves at once; note, finding and photo kept on the page until saved. */
export function IntakeItemRow({ value, findings, photos, saving, error, onSave }: IntakeItemRowProps) {
  const words = intakeItemWords[value.item];
  const [note, setNote] = useState(value.note);
  const [findingId, setFindingId] = useState(value.findingId);
  const [photoId, setPhotoId] = useState(value.photoId);
  const changed = note !== value.note || findingId !== value.findingId || photoId !== value.photoId;
  const base = `intake-${value.item}`;
  const photo = photos.find((p) => p.id === photoId);
  const save = (done: boolean) => onSave({ item: value.item, done, note, findingId, photoId });
  return (
    <li className="space-y-2 rounded-lg border border-rule bg-panel p-3">
      <div className="flex items-start gap-3">
        <input
          id={`${base}-done`}
          type="checkbox"
          className="mt-1 h-5 w-5 accent-glow"
          checked={value.done}
          disabled={saving}
          onChange={(e) => save(e.target.checked)}
          aria-describedby={`${base}-hint`}
        />
        <div>
          <label htmlFor={`${base}-done`} className="font-semibold">
            {words.label}
          </label>
          <p id={`${base}-hint`} className="text-sm text-ink-soft">
            {words.hint}
          </p>
        </div>
      </div>
      <div className="grid gap-2 sm:grid-cols-[2fr_1fr_1fr]">
        <div>
          <label htmlFor={`${base}-note`} className="text-sm font-semibold">
            Note
          </label>
          <textarea
            id={`${base}-note`}
            rows={2}
            value={note}
            maxLength={500}
            onChange={(e) => setNote(e.target.value)}
            className={inputClass}
          />
        </div>
        <div>
          <label htmlFor={`${base}-finding`} className="text-sm font-semibold">
            Finding
          </label>
          <select
            id={`${base}-finding`}
            value={findingId ?? ''}
            onChange={(e) => setFindingId(e.target.value ? Number(e.target.value) : null)}
            className={inputClass}
          >
            <FindingOptions findings={findings} none="None" />
          </select>
        </div>
        <div>
          <label htmlFor={`${base}-photo`} className="text-sm font-semibold">
            Photo
          </label>
          <select
            id={`${base}-photo`}
            value={photoId ?? ''}
            onChange={(e) => setPhotoId(e.target.value ? Number(e.target.value) : null)}
            className={inputClass}
          >
            <option value="">None</option>
            {photos.map((p) => (
              <option key={p.id} value={p.id}>
                {p.label}
              </option>
            ))}
          </select>
        </div>
      </div>
      <div className="flex flex-wrap items-center gap-3">
        {photo && (
          <img
            src={photo.thumbUrl}
            alt={`Photo for ${words.label}: ${photo.label}`}
            className="h-16 w-24 rounded border border-rule object-cover"
          />
        )}
        <Button variant="quiet" disabled={!changed || saving} onClick={() => save(value.done)}>
          {saving ? 'Saving…' : 'Save item'}
        </Button>
        {changed && !saving && <span className="text-sm text-ink-soft">Not saved yet</span>}
        {value.checkedBy && <span className="text-sm text-ink-soft">Last changed by {value.checkedBy}</span>}
      </div>
      {error && (
        <p role="alert" className="text-sm font-semibold text-danger">
          {error}
        </p>
      )}
    </li>
  );
}
