import type { PartWarning } from '../../../../shared/bench';
import { WarningList } from './warning-list';

/** The warnings for the line as typed; the server's, shown in the ledger once saved, are the ones that count. */
export function WarningsPreview({ warnings, compared }: { warnings: PartWarning[]; compared: boolean }) {
  return (
    <section
      aria-label="Warnings preview"
      aria-live="polite"
      className="space-y-1 rounded-lg border border-rule bg-sunken px-3 py-2"
    >
      <h4 className="text-sm font-semibold">Checks on this change</h4>
      {warnings.length > 0 ? (
        <WarningList warnings={warnings} />
      ) : (
        <p className="text-sm text-ink-soft">
          {compared
            ? 'No warnings from the ratings given. The ledger shows the checks stored once saved.'
            : 'Give what came out and what goes in, with their ratings (e.g. 0.022µF 350V), and the checks appear here.'}
        </p>
      )}
    </section>
  );
}
