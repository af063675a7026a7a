import { labelDrop, markerOutline, outlinePath, RING_HOLE } from '../lib/marker-outline';
import { HALO_DARK, HALO_LIGHT, PAPER } from '../lib/pen';
import type { MarkerShape } from '../../../lib/finding-legend';

const R = 11;

/**
 * A marker as on the canvas, in SVG, for the legend and the findings list: the shape, its fill, the text in it
 * and the glyph badge. Without `fill` it is an outline in the text colour (a severity shape on its own).
 * Decorative: the words beside it say the same.
 */
export function MarkerGlyph({
  shape,
  fill,
  ink = '#000000',
  text,
  badge,
  size = 28,
}: {
  shape: MarkerShape;
  fill?: string;
  ink?: string;
  text?: string;
  badge?: string;
  size?: number;
}) {
  const d = outlinePath(markerOutline(shape, R), 0, 0);
  const textFill = shape === 'ring' && fill ? '#000000' : ink;
  return (
    <svg viewBox="-20 -20 40 40" width={size} height={size} aria-hidden="true" className="shrink-0 overflow-visible">
      {fill ? (
        <>
          <path d={d} fill={fill} stroke={HALO_DARK} strokeWidth={6} strokeLinejoin="round" />
          <path d={d} fill={fill} stroke={HALO_LIGHT} strokeWidth={3} strokeLinejoin="round" />
          <path d={d} fill={fill} />
          {shape === 'ring' && <circle r={R * RING_HOLE} fill={PAPER} />}
        </>
      ) : (
        <path
          d={d}
          fill={shape === 'ring' ? 'none' : 'currentColor'}
          fillOpacity={0.18}
          stroke="currentColor"
          strokeWidth={2.5}
          strokeLinejoin="round"
        />
      )}
      {shape === 'ring' && !fill && <circle r={R} fill="none" stroke="currentColor" strokeWidth={5} />}
      {text && (
        <text
          y={labelDrop(shape, R)}
          fill={textFill}
          fontSize={text.length === 1 ? 13 : text.length === 2 ? 10 : 8}
          fontWeight={700}
          textAnchor="middle"
          dominantBaseline="central"
        >
          {text}
        </text>
      )}
      {badge && (
        <g transform={`translate(${R * 0.95} ${-R * 0.95})`}>
          <circle r={6.5} fill={HALO_LIGHT} stroke={HALO_DARK} strokeWidth={1.5} />
          <text fill="#000000" fontSize={8.5} fontWeight={700} textAnchor="middle" dominantBaseline="central">
            {badge}
          </text>
        </g>
      )}
    </svg>
  );
}
