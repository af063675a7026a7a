import { useState } from 'react';
import { can, type Role } from '../../../../shared/permissions';
import type { Part } from '../../../../shared/schemas/parts';
import { Button, buttonClass } from '../../../components/button';
import { ErrorState, Loading } from '../../../components/states';
import { partsCsvHref } from '../api/get-parts-csv';
import { useParts } from '../api/get-parts';
import type { FindingChoice } from '../../../components/finding-options';
import { useCurrency } from '../hooks/use-currency';
import { PartForm } from './part-form';
import { PartsLedger } from './parts-ledger';
import { ShoppingList } from './shopping-list';

export type PartsView = 'ledger' | 'shopping';

export interface PartsTabProps {
  restorationId: number;
  role: Role;
  /** Names the set on the printed shopping list. */
  setName: string;
  findings?: FindingChoice[];
  view: PartsView;
  onViewChange: (view: PartsView) => void;
}

type FormState = { open: false } | { open: true; part?: Part };

const viewButton = (active: boolean) =>
  `min-h-11 rounded-md px-3 font-semibold ${active ? 'bg-glow-soft text-glow-strong' : 'text-ink-soft hover:bg-sunken'}`;

/**
 * A restoration's parts: the ledger (technicians record and change lines), or the shopping list to print;
 * the ledger as CSV for the workshop. Owners read only the ledger of what was fitted or kept, without costs.
 */
export function PartsTab({ restorationId, role, setName, findings, view: asked, onViewChange }: PartsTabProps) {
  const canEdit = can(role, 'parts.edit');
  // The shopping list and the CSV are the workshop's; an owner reads the ledger of what was done.
  const workshop = can(role, 'workshop.view');
  const view = workshop ? asked : 'ledger';
  const parts = useParts(restorationId);
  const [form, setForm] = useState<FormState>({ open: false });
  const [currency] = useCurrency();
  const close = () => setForm({ open: false });
  return (
    <div className="space-y-4">
      {workshop && (
        <div className="flex flex-wrap items-center justify-between gap-3 print:hidden">
          <div role="group" aria-label="Show" className="inline-flex gap-1 rounded-lg border border-rule bg-panel p-1">
            <button
              type="button"
              aria-pressed={view === 'ledger'}
              className={viewButton(view === 'ledger')}
              onClick={() => onViewChange('ledger')}
            >
              Ledger
            </button>
            <button
              type="button"
              aria-pressed={view === 'shopping'}
              className={viewButton(view === 'shopping')}
              onClick={() => onViewChange('shopping')}
            >
              Shopping list
            </button>
          </div>
          <div className="flex flex-wrap items-center gap-3">
            <a href={partsCsvHref(restorationId, currency)} download className={buttonClass('quiet')}>
              Export CSV
            </a>
          </div>
        </div>
      )}
      {view === 'shopping' ? (
        parts.isPending ? (
          <Loading label="Fetching the parts ledger…" />
        ) : parts.isError ? (
          <ErrorState error={parts.error} onRetry={() => parts.refetch()} />
        ) : (
          <ShoppingList parts={parts.data} setName={setName} />
        )
      ) : (
        <>
          {canEdit &&
            (form.open ? (
              <PartForm
                key={form.part?.id ?? 'new'}
                restorationId={restorationId}
                part={form.part}
                findings={findings}
                onDone={form.part ? close : undefined}
                onCancel={close}
              />
            ) : (
              <Button onClick={() => setForm({ open: true })}>Record a part</Button>
            ))}
          <PartsLedger
            restorationId={restorationId}
            role={role}
            findings={findings}
            onEdit={canEdit ? (part) => setForm({ open: true, part }) : undefined}
          />
        </>
      )}
    </div>
  );
}
