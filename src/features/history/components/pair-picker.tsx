import { useMemo, useState } from 'react';
import { views, viewLabels, type Photo, type View } from '../../../../shared/schemas/photos';
import { Field, inputClass } from '../../../components/field';
import { photoTime } from '../lib/suggest-pairs';
import { photoChoiceLabel } from '../lib/photo-words';
import { BeforeAfter } from './before-after';

interface Choice {
  view: View;
  beforeId: number;
  afterId: number;
}

/** Photos of each view that has at least two, oldest first, in view order. */
function comparableViews(photos: Photo[]): Map<View, Photo[]> {
  const byView = new Map<View, Photo[]>();
  for (const view of views) {
    const ofView = photos.filter((p) => p.view === view).sort((a, b) => photoTime(a) - photoTime(b) || a.id - b.id);
    if (ofView.length >= 2) byView.set(view, ofView);
  }
  return byView;
}

/** For a view, the oldest photo against the newest. */
const defaultsFor = (view: View, ofView: Photo[]): Choice => ({
  view,
  beforeId: ofView[0]!.id,
  afterId: ofView[ofView.length - 1]!.id,
});

/**
 * For technicians and mentors: compare any two photos of one view (the first on the left of the divider), e.g.
 * two "during" shots either side of a recapping.
 */
export function PairPicker({ photos }: { photos: Photo[] }) {
  const byView = useMemo(() => comparableViews(photos), [photos]);
  const [picked, setPicked] = useState<Choice | null>(null);

  const firstView = byView.keys().next().value;
  if (firstView === undefined)
    return <p className="text-ink-soft">Comparing needs two photos of the same view; none has two yet.</p>;

  // A choice that no longer fits the photos (one was deleted or moved to another view) falls back to the defaults.
  const view = picked && byView.has(picked.view) ? picked.view : firstView;
  const ofView = byView.get(view)!;
  const defaults = defaultsFor(view, ofView);
  const has = (id: number | undefined) => id !== undefined && ofView.some((p) => p.id === id);
  const beforeId = picked?.view === view && has(picked.beforeId) ? picked.beforeId : defaults.beforeId;
  const afterId = picked?.view === view && has(picked.afterId) ? picked.afterId : defaults.afterId;
  const before = ofView.find((p) => p.id === beforeId)!;
  const after = ofView.find((p) => p.id === afterId)!;

  const photoSelect = (label: string, value: number, onChange: (id: number) => void) => (
    <Field label={label}>
      {(props) => (
        <select {...props} value={value} onChange={(e) => onChange(Number(e.target.value))} className={inputClass}>
          {ofView.map((p) => (
            <option key={p.id} value={p.id}>
              {photoChoiceLabel(p)}
            </option>
          ))}
        </select>
      )}
    </Field>
  );

  return (
    <div className="space-y-4">
      <div className="grid gap-3 sm:grid-cols-3">
        <Field label="View">
          {(props) => (
            <select
              {...props}
              value={view}
              onChange={(e) => {
                const next = e.target.value as View;
                setPicked(defaultsFor(next, byView.get(next)!));
              }}
              className={inputClass}
            >
              {[...byView.keys()].map((v) => (
                <option key={v} value={v}>
                  {viewLabels[v]} ({byView.get(v)!.length} photos)
                </option>
              ))}
            </select>
          )}
        </Field>
        {photoSelect('Left of the divider', beforeId, (id) => setPicked({ view, beforeId: id, afterId }))}
        {photoSelect('Right of the divider', afterId, (id) => setPicked({ view, beforeId, afterId: id }))}
      </div>
      {beforeId === afterId ? (
        <p role="status" className="text-ink-soft">
          Choose two different photos to compare them.
        </p>
      ) : (
        <BeforeAfter key={`${beforeId}-${afterId}`} before={before} after={after} />
      )}
    </div>
  );
}
