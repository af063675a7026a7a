import { POWERED_CAUTION, type SymptomCause } from '../../../../shared/bench/symptoms';

/** A cause's test: where to measure, how, the reading that clears it, its source, and the cautions when powered. */
export function CauseTest({ cause }: { cause: SymptomCause }) {
  const { test } = cause;
  return (
    <div className="space-y-1 text-sm">
      <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5">
        <dt className="text-ink-soft">Where</dt>
        <dd>{test.where}</dd>
        <dt className="text-ink-soft">How</dt>
        <dd>{test.how}</dd>
        <dt className="text-ink-soft">Expect</dt>
        <dd>{test.expected}</dd>
      </dl>
      {test.powered && (
        <p className="rounded border border-danger px-2 py-1 text-danger">
          <span className="font-semibold">Set powered. </span>
          {POWERED_CAUTION}
        </p>
      )}
      <p className="text-xs text-ink-soft">Source: {cause.source}</p>
    </div>
  );
}
