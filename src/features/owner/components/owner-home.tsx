import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { Restoration } from '../../../../shared/schemas/restorations';
import { EmptyState } from '../../../components/states';
import { greeting, setName } from '../lib/owner-words';
import { SafetyReminder } from './safety-reminder';

/**
 * The owner's home: a greeting, then their one set directly, or a card per set (a card opens `?set=<id>`).
 * `renderSet` and `renderCard` draw a set with its data, which the route fetches.
 */
export function OwnerHome({
  name,
  sets,
  selectedId,
  renderSet,
  renderCard,
  now,
}: {
  name: string | null | undefined;
  /** The sets the person owns (role "owner"). */
  sets: Restoration[];
  selectedId?: number;
  renderSet: (set: Restoration) => ReactNode;
  renderCard: (set: Restoration, to: string) => ReactNode;
  /** For the greeting's part of the day; tests fix it. */
  now?: Date;
}) {
  const selected = sets.length === 1 ? sets[0] : sets.find((s) => s.id === selectedId);
  const intro =
    sets.length === 0
      ? 'Nothing to follow yet.'
      : selected
        ? `Here is how your ${setName(selected)} is getting on.`
        : 'Here are the sets you are following. Choose one to see its story.';
  return (
    <div className="mx-auto max-w-2xl space-y-8">
      <header className="space-y-1">
        <h1 className="text-2xl font-bold">{greeting(name, now)}</h1>
        <p className="text-lg text-ink-soft">{intro}</p>
      </header>
      {sets.length === 0 ? (
        <EmptyState title="No sets to follow yet">
          When a workshop invites you to follow your set, it appears here.
        </EmptyState>
      ) : selected ? (
        <>
          {sets.length > 1 && (
            <Link
              to={{ search: '' }}
              className="inline-flex min-h-11 items-center gap-1 font-semibold text-glow-strong hover:underline"
            >
              <span aria-hidden="true">←</span> All your sets
            </Link>
          )}
          {renderSet(selected)}
        </>
      ) : (
        <ul className="grid gap-4 sm:grid-cols-2" aria-label="Your sets">
          {sets.map((s) => (
            <li key={s.id}>{renderCard(s, `?set=${s.id}`)}</li>
          ))}
        </ul>
      )}
      <SafetyReminder />
    </div>
  );
}
