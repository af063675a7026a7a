import { useState } from 'react';
import {
  calculatorAnchor,
  calculatorCatalogue,
  matchesSearch,
} from '../../features/calculators/components/calculator-catalogue';
import { CalculatorGroup } from '../../features/calculators/components/calculator-group';
import { CalculatorIndex } from '../../features/calculators/components/calculator-index';

export function CalculatorsRoute() {
  const [search, setSearch] = useState('');
  // Cards that do not match are hidden, not removed, so values typed into them survive a search.
  const groups = calculatorCatalogue.map((group) => ({
    ...group,
    entries: group.entries.map((entry) => ({ entry, shown: matchesSearch(entry, search) })),
  }));
  const visible = groups
    .map((g) => ({ title: g.title, entries: g.entries.filter((e) => e.shown).map((e) => e.entry) }))
    .filter((g) => g.entries.length > 0);
  return (
    <div className="space-y-8">
      <div>
        <h1 className="text-2xl font-bold">Bench calculators</h1>
        <p className="text-ink-soft">
          Type values the way they are printed (2k2, 330R, 8 MF, 350 WV, 6n8) and the answer follows as you type.
        </p>
      </div>
      <CalculatorIndex
        groups={visible}
        search={search}
        onSearch={setSearch}
        shown={visible.reduce((n, g) => n + g.entries.length, 0)}
      />
      {groups.map((group) => (
        <div key={group.title} hidden={!group.entries.some((e) => e.shown)}>
          <CalculatorGroup title={group.title}>
            {group.entries.map(({ entry, shown }) => (
              <div key={entry.title} id={calculatorAnchor(entry.title)} hidden={!shown} className="scroll-mt-4">
                {entry.card}
              </div>
            ))}
          </CalculatorGroup>
        </div>
      ))}
    </div>
  );
}
