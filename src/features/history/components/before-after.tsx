import { useState } from 'react';
import { viewLabels, type Photo } from '../../../../shared/schemas/photos';
import { photoDay, photoWords } from '../lib/photo-words';
import { CompareSlider } from './compare-slider';
import { photoSources } from '../../../lib/photo-sources';

function Side({ photo, label, sizes }: { photo: Photo; label: string; sizes: string }) {
  return (
    <figure className="space-y-1">
      <img
        alt={`${label} — ${photoWords(photo)}`}
        width={photo.width || undefined}
        height={photo.height || undefined}
        loading="lazy"
        decoding="async"
        {...photoSources(photo, `(min-width: 640px) 50vw, ${sizes}`)}
        className="h-auto w-full rounded-xl bg-sunken object-cover"
      />
      <figcaption className="text-sm text-ink-soft">
        <span className="font-semibold text-ink">{label}</span> · {photoDay(photo)}
        {photo.caption && <> · {photo.caption}</>}
      </figcaption>
    </figure>
  );
}

/** The page's full width (max-w-6xl with its padding); pass narrower `sizes` where the column is narrower. */
const WIDE_SIZES = '(min-width: 1184px) 1152px, calc(100vw - 32px)';

/** One view of the set before and after the work: a slider over the two photos, or the two side by side. */
export function BeforeAfter({ before, after, sizes = WIDE_SIZES }: { before: Photo; after: Photo; sizes?: string }) {
  const [sideBySide, setSideBySide] = useState(false);
  const sameView = before.view === after.view;
  return (
    <figure className="space-y-2">
      <figcaption className="flex flex-wrap items-center justify-between gap-2">
        <span className="min-w-0">
          <span className="block font-bold">
            {sameView
              ? viewLabels[before.view]
              : `${viewLabels[before.view]} and ${viewLabels[after.view].toLowerCase()}`}
          </span>
          <span className="block text-sm text-ink-soft">
            Before {photoDay(before)} · after {photoDay(after)}
          </span>
        </span>
        <button
          type="button"
          aria-pressed={sideBySide}
          onClick={() => setSideBySide((v) => !v)}
          className={`inline-flex min-h-11 items-center gap-2 rounded-lg border px-3 text-sm font-semibold ${
            sideBySide
              ? 'border-glow bg-glow-soft text-glow-strong'
              : 'border-rule bg-panel text-ink-soft hover:bg-sunken'
          }`}
        >
          <svg
            viewBox="0 0 20 20"
            aria-hidden="true"
            className="h-4 w-4"
            fill="none"
            stroke="currentColor"
            strokeWidth={1.8}
          >
            <rect x="2" y="4" width="7" height="12" rx="1" />
            <rect x="11" y="4" width="7" height="12" rx="1" />
          </svg>
          Side by side
        </button>
      </figcaption>
      {sideBySide ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <Side photo={before} label="Before" sizes={sizes} />
          <Side photo={after} label="After" sizes={sizes} />
        </div>
      ) : (
        <CompareSlider before={before} after={after} sizes={sizes} />
      )}
    </figure>
  );
}
