import type { HelpPhoto } from '../../../../shared/schemas/help';

/** A chosen photo with its pins drawn where they were placed (points are fractions of the image's size). */
export function HelpPhotoFigure({ photo }: { photo: HelpPhoto }) {
  return (
    <figure className="break-inside-avoid space-y-2">
      <div className="relative inline-block max-w-full">
        <img
          src={photo.url}
          alt={photo.caption || `Photo of the ${photo.view}`}
          width={photo.width}
          height={photo.height}
          className="h-auto max-w-full rounded-lg border border-rule print:max-h-[9cm] print:w-auto"
        />
        <svg className="absolute inset-0 h-full w-full" viewBox="0 0 1 1" preserveAspectRatio="none" aria-hidden="true">
          {photo.pins.map((pin) => {
            const p = pin.points[0]!;
            return (
              <g key={pin.id} data-testid="help-pin" data-x={p.x} data-y={p.y}>
                <circle
                  cx={p.x}
                  cy={p.y}
                  r={0.018}
                  className="fill-glow/40 stroke-glow-strong"
                  strokeWidth={0.004}
                  vectorEffect="non-scaling-stroke"
                />
              </g>
            );
          })}
        </svg>
        {photo.pins.map((pin) => {
          const p = pin.points[0]!;
          return (
            <span
              key={pin.id}
              className="absolute -translate-x-1/2 -translate-y-full rounded bg-bakelite px-1 font-mono text-xs font-bold text-white"
              style={{ left: `${p.x * 100}%`, top: `${(p.y - 0.02) * 100}%` }}
              aria-hidden="true"
            >
              {pin.number}
            </span>
          );
        })}
      </div>
      <figcaption className="text-sm">
        {photo.caption && <p className="font-semibold">{photo.caption}</p>}
        {photo.pins.length > 0 && (
          <ol className="mt-1 space-y-0.5">
            {photo.pins.map((pin) => (
              <li key={pin.id}>
                <span className="font-mono font-bold">{pin.number}</span> {pin.title}
                {pin.componentRef && <span className="font-mono"> ({pin.componentRef})</span>}{' '}
                <span className="text-ink-soft">· {pin.status}</span>
                {pin.closeupUrl && (
                  <img
                    src={pin.closeupUrl}
                    alt={`Close-up of spot ${pin.number}: ${pin.title}`}
                    loading="lazy"
                    data-testid="help-closeup"
                    className="mt-1 block max-h-40 rounded border border-rule print:max-h-32"
                  />
                )}
              </li>
            ))}
          </ol>
        )}
      </figcaption>
    </figure>
  );
}
