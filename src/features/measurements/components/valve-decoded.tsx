import { valveWords } from '../lib/valve-words';

/** A valve type in words: heater, electrodes and base; or the library's reason it cannot be read. */
export function ValveDecoded({ type }: { type: string }) {
  const words = valveWords(type);
  if (!words.ok) return <p className="text-sm text-ink-soft">{words.message}</p>;
  return (
    <div className="text-sm">
      {words.description && <p className="font-semibold">{words.description}</p>}
      <dl className="grid grid-cols-[auto_1fr] gap-x-2">
        <dt className="text-ink-soft">Heater</dt>
        <dd>{words.heater}</dd>
        <dt className="text-ink-soft">Systems</dt>
        <dd>{words.systems}</dd>
        <dt className="text-ink-soft">Base</dt>
        <dd>{words.base}</dd>
      </dl>
    </div>
  );
}
