import { useId } from 'react';
import { inputClass } from '../../../components/field';
import { calculatorAnchor, type CatalogueEntry } from './calculator-catalogue';

/** The top of the calculators page: a search box that narrows the page, and links to each calculator shown. */
export function CalculatorIndex({
  groups,
  search,
  onSearch,
  shown,
}: {
  groups: { title: string; entries: CatalogueEntry[] }[];
  search: string;
  onSearch: (text: string) => void;
  shown: number;
}) {
  const searchId = useId();
  const countId = useId();
  return (
    <nav aria-label="Calculators on this page" className="space-y-3 rounded-xl border border-rule bg-panel p-4">
      <div>
        <label htmlFor={searchId} className="font-semibold">
          Find a calculator
        </label>
        <input
          id={searchId}
          type="search"
          value={search}
          onChange={(e) => onSearch(e.target.value)}
          placeholder="e.g. bias, ESR, heater"
          aria-describedby={countId}
          className={`${inputClass} mt-1`}
          autoComplete="off"
        />
        <p id={countId} role="status" className="mt-1 text-sm text-ink-soft">
          {search.trim() === ''
            ? ''
            : shown === 0
              ? 'No calculator matches; try another word.'
              : `${shown} ${shown === 1 ? 'calculator matches' : 'calculators match'}.`}
        </p>
      </div>
      <div className="grid gap-x-6 gap-y-2 sm:grid-cols-2 lg:grid-cols-3">
        {groups.map((group) => (
          <div key={group.title}>
            <p className="text-sm font-bold text-ink-soft">{group.title}</p>
            <ul className="text-sm">
              {group.entries.map((entry) => (
                <li key={entry.title}>
                  <a
                    href={`#${calculatorAnchor(entry.title)}`}
                    className="inline-block py-1 text-glow-strong underline-offset-2 hover:underline"
                  >
                    {entry.title}
                  </a>
                </li>
              ))}
            </ul>
          </div>
        ))}
      </div>
    </nav>
  );
}
