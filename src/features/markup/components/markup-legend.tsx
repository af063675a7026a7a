import { severities, statuses } from '../../../../shared/schemas/findings';
import { severityMarker, statusStyle } from '../../../lib/finding-legend';
import { FloatingPanel } from './floating-panel';
import { MarkerGlyph } from './marker-glyph';

/** What the marks mean, in words as well as colour, glyph and shape: it reads the same in greyscale. */
export function MarkupLegend({ onClose }: { onClose: () => void }) {
  return (
    <FloatingPanel title="Legend" onClose={onClose}>
      <h3 className="mt-1 text-sm font-bold text-ink-soft">Status: colour and glyph</h3>
      <ul className="mt-1 space-y-1">
        {statuses.map((s) => {
          const style = statusStyle(s);
          return (
            <li key={s} className="flex items-center gap-2">
              <MarkerGlyph shape="circle" fill={style.colour} ink={style.ink} text={style.glyph} size={30} />
              <span>{style.label}</span>
            </li>
          );
        })}
      </ul>
      <h3 className="mt-3 text-sm font-bold text-ink-soft">Severity: marker shape</h3>
      <ul className="mt-1 space-y-1">
        {severities.map((s) => {
          const marker = severityMarker(s);
          return (
            <li key={s} className="flex items-center gap-2">
              <MarkerGlyph shape={marker.shape} size={30} />
              <span>{marker.label}</span>
            </li>
          );
        })}
      </ul>
      <p className="mt-3 text-sm text-ink-soft">
        Each finding&apos;s number is on its marker, with the status glyph beside it. A pin is the marker itself; a
        circle, rectangle, arrow or freehand line is drawn in its status colour and carries the marker. Markers keep
        their size at every zoom.
      </p>
    </FloatingPanel>
  );
}
