import { useId, useState } from 'react';
import type { SymptomCause } from '../../../../shared/bench/symptoms';
import type { Photo } from '../../../../shared/schemas/photos';
import {
  causeResultLabels,
  causeResults,
  type CauseResult,
  type SymptomCheckInput,
} from '../../../../shared/schemas/symptom-checks';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';

/** Ticks a cause off: its result, the test's reading (judged like any other), a note, and a finding if confirmed. */
export function CauseForm({
  cause,
  photos,
  pending,
  onSave,
}: {
  cause: SymptomCause;
  photos: Photo[];
  pending: boolean;
  onSave: (input: SymptomCheckInput) => void;
}) {
  const id = useId();
  const [result, setResult] = useState<CauseResult>('ruled-out');
  const [location, setLocation] = useState(cause.test.location ?? '');
  const [expected, setExpected] = useState('');
  const [reading, setReading] = useState('');
  const [note, setNote] = useState('');
  const [photoId, setPhotoId] = useState('');
  const quantity = cause.test.quantity;
  const save = () =>
    onSave({
      result,
      note,
      ...(quantity && reading.trim()
        ? { reading: { location, quantity, expected, reading, powerOn: cause.test.powered } }
        : {}),
      ...(result === 'confirmed' && photoId ? { finding: { photoId: Number(photoId) } } : {}),
    });
  return (
    <div className="space-y-2 print:hidden">
      <fieldset className="flex flex-wrap gap-3">
        <legend className="sr-only">Result for {cause.cause}</legend>
        {causeResults.map((r) => (
          <label key={r} className="inline-flex min-h-11 items-center gap-2">
            <input type="radio" name={`${id}-result`} value={r} checked={result === r} onChange={() => setResult(r)} />{' '}
            {causeResultLabels[r]}
          </label>
        ))}
      </fieldset>
      {quantity && (
        <div className="grid gap-2 sm:grid-cols-3">
          <label className="text-sm">
            Where measured
            <input className={inputClass} value={location} onChange={(e) => setLocation(e.target.value)} />
          </label>
          <label className="text-sm">
            Expected (chart)
            <input
              className={inputClass}
              value={expected}
              onChange={(e) => setExpected(e.target.value)}
              placeholder="e.g. 250"
            />
          </label>
          <label className="text-sm">
            Reading
            <input
              className={inputClass}
              value={reading}
              onChange={(e) => setReading(e.target.value)}
              placeholder="as the meter showed it"
            />
          </label>
        </div>
      )}
      <label className="block text-sm">
        Note (stays in the workshop)
        <textarea className={inputClass} rows={2} value={note} onChange={(e) => setNote(e.target.value)} />
      </label>
      {result === 'confirmed' && (
        <label className="block text-sm">
          Open a confirmed finding on
          <select className={inputClass} value={photoId} onChange={(e) => setPhotoId(e.target.value)}>
            <option value="">No finding</option>
            {photos.map((p) => (
              <option key={p.id} value={p.id}>
                {p.caption || `Photo ${p.id}`} ({p.view})
              </option>
            ))}
          </select>
          <span className="text-ink-soft">It is pinned in the photo's middle; move it onto the part on the photo.</span>
        </label>
      )}
      <Button disabled={pending} onClick={save}>
        {pending ? 'Saving…' : 'Save result'}
      </Button>
    </div>
  );
}
