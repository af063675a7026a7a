import { swatchOf } from '../lib/band-colours';

/** A picture of the part with its bands, the tolerance band set apart at the right as on a real resistor. */
export function ResistorDrawing({ colours, tolerance }: { colours: readonly string[]; tolerance: boolean }) {
  const main = tolerance ? colours.slice(0, -1) : colours;
  const last = tolerance ? colours[colours.length - 1] : undefined;
  return (
    <div aria-hidden="true" className="flex items-center">
      <span className="h-0.5 w-6 bg-ink-soft" />
      <span className="flex h-10 flex-1 items-stretch gap-1.5 rounded-full border border-rule bg-glow-soft px-5">
        {main.map((colour, index) => (
          <span key={index} className="w-2.5 border-x border-ink/40" style={{ backgroundColor: swatchOf(colour) }} />
        ))}
        <span className="flex-1" />
        {last !== undefined && (
          <span className="w-2.5 border-x border-ink/40" style={{ backgroundColor: swatchOf(last) }} />
        )}
      </span>
      <span className="h-0.5 w-6 bg-ink-soft" />
    </div>
  );
}
