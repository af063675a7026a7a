import { controlClass } from '../lib/control-styles';
import { formatZoom } from '../lib/zoom';

/**
 * −, the zoom readout, +, Fit and Actual size (100 %: one photo pixel per screen pixel). The readout is plain
 * text in a sunken well with its name beside it, so it never passes for the bordered buttons around it.
 */
export function ZoomControls({
  scale,
  onZoomIn,
  onZoomOut,
  onFit,
  onActualSize,
}: {
  scale: number | undefined;
  onZoomIn: () => void;
  onZoomOut: () => void;
  onFit: () => void;
  onActualSize: () => void;
}) {
  return (
    <div role="group" aria-label="Zoom" className="flex items-center gap-1">
      <button
        type="button"
        aria-label="Zoom out"
        aria-keyshortcuts="-"
        title="Zoom out (−)"
        onClick={onZoomOut}
        className={controlClass}
      >
        <span aria-hidden="true" className="text-lg leading-none">
          −
        </span>
      </button>
      <output
        aria-label="Zoom level"
        aria-live="off"
        className="inline-flex items-baseline gap-1 rounded-md bg-sunken px-2 py-1 text-sm"
      >
        <span aria-hidden="true" className="text-xs text-ink-soft">
          Zoom
        </span>
        <span className="min-w-11 text-right font-mono tabular-nums">
          {scale === undefined ? '—' : formatZoom(scale)}
        </span>
      </output>
      <button
        type="button"
        aria-label="Zoom in"
        aria-keyshortcuts="+"
        title="Zoom in (+)"
        onClick={onZoomIn}
        className={controlClass}
      >
        <span aria-hidden="true" className="text-lg leading-none">
          +
        </span>
      </button>
      <button
        type="button"
        aria-keyshortcuts="0"
        title="Fit the whole photo (0)"
        onClick={onFit}
        className={controlClass}
      >
        Fit
      </button>
      <button
        type="button"
        aria-keyshortcuts="1"
        title="Actual size, 100 %: one photo pixel per screen pixel (1)"
        onClick={onActualSize}
        className={`${controlClass} whitespace-nowrap`}
      >
        Actual size
      </button>
    </div>
  );
}
