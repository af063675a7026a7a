import { useState } from 'react';
import { measuredQuantities, readingKinds, type MeasuredQuantity } from '../../../../shared/bench/reading-kinds';
import type { Photo } from '../../../../shared/schemas/photos';
import type { ReadingAnswerInput, ReadingRequest } from '../../../../shared/schemas/reading-requests';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';

/** The technician's answer: a reading (filed and judged like any other), a photo already on the set, a note, or several. */
export function AnswerForm({
  request,
  photos,
  pending,
  onAnswer,
}: {
  request: ReadingRequest;
  photos: Photo[];
  pending: boolean;
  onAnswer: (input: ReadingAnswerInput) => void;
}) {
  const [location, setLocation] = useState('');
  const [quantity, setQuantity] = useState<MeasuredQuantity>('dc-voltage');
  const [expected, setExpected] = useState('');
  const [reading, setReading] = useState('');
  const [photoId, setPhotoId] = useState('');
  const [note, setNote] = useState('');
  const send = () =>
    onAnswer({
      note,
      ...(reading.trim() ? { reading: { location: location || 'Test point', quantity, expected, reading } } : {}),
      ...(photoId ? { photoId: Number(photoId) } : {}),
    });
  return (
    <div className="space-y-2 print:hidden">
      <div className="grid gap-2 sm:grid-cols-4">
        <label className="text-sm">
          Where measured
          <input
            className={inputClass}
            value={location}
            onChange={(e) => setLocation(e.target.value)}
            placeholder="e.g. V3 pin 6"
          />
        </label>
        <label className="text-sm">
          Kind
          <select
            className={inputClass}
            value={quantity}
            onChange={(e) => setQuantity(e.target.value as MeasuredQuantity)}
          >
            {measuredQuantities.map((q) => (
              <option key={q} value={q}>
                {readingKinds[q].label}
              </option>
            ))}
          </select>
        </label>
        <label className="text-sm">
          Expected (chart)
          <input className={inputClass} value={expected} onChange={(e) => setExpected(e.target.value)} />
        </label>
        <label className="text-sm">
          Reading
          <input className={inputClass} value={reading} onChange={(e) => setReading(e.target.value)} />
        </label>
      </div>
      <label className="block text-sm">
        Photo
        <select className={inputClass} value={photoId} onChange={(e) => setPhotoId(e.target.value)}>
          <option value="">No photo (upload it on the Photos tab first)</option>
          {photos.map((p) => (
            <option key={p.id} value={p.id}>
              {p.caption || `Photo ${p.id}`} ({p.view})
            </option>
          ))}
        </select>
      </label>
      <label className="block text-sm">
        Note
        <textarea className={inputClass} rows={2} value={note} onChange={(e) => setNote(e.target.value)} />
      </label>
      <Button disabled={pending} onClick={send} aria-label={`Send the answer to: ${request.body}`}>
        {pending ? 'Sending…' : 'Send the answer'}
      </Button>
    </div>
  );
}
