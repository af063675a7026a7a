import { useState } from 'react';
import { parseMoney } from '../../../../shared/money/currency';
import {
  estimateExtraLabels,
  estimateExtras,
  type EstimateLineInput,
  type WorkshopSettings,
} from '../../../../shared/schemas/estimates';
import { Button } from '../../../components/button';
import { inputClass } from '../../../components/field';
import { useCreateEstimate } from '../api/estimates';
import { moneyText } from './money-text';
import { LabelledOptions } from '../../../components/labelled-options';

type Kind = EstimateLineInput['kind'];
interface Draft {
  kind: Kind;
  description: string;
  extra: (typeof estimateExtras)[number];
  low: string;
  high: string;
}
const blank = (kind: Kind): Draft => ({ kind, description: '', extra: 'no-schematic', low: '', high: '' });

/** Hours as typed ("1.5", "2") to whole minutes; null when it is no number of hours. */
const minutesOf = (text: string) => (/^\d+(\.\d+)?$/.test(text.trim()) ? Math.round(Number(text.trim()) * 60) : null);

/** Turns the typed lines into the API's lines, or says which line is wrong. */
function toLines(drafts: Draft[], currency: string): { lines: EstimateLineInput[] } | { error: string } {
  const lines: EstimateLineInput[] = [];
  for (const [i, d] of drafts.entries()) {
    const where = `Line ${i + 1}`;
    if (!d.description.trim()) return { error: `${where}: say what the line is for.` };
    const read = d.kind === 'labour' ? minutesOf : (t: string) => parseMoney(t, currency)?.amount ?? null;
    const low = read(d.low);
    const high = d.high.trim() ? read(d.high) : low;
    if (low === null || high === null || low < 0)
      return {
        error: `${where}: ${d.kind === 'labour' ? 'type hours, e.g. 1.5' : `type an amount in ${currency}, e.g. 12.50`}.`,
      };
    if (low > high) return { error: `${where}: the low figure is above the high one.` };
    const base = { description: d.description.trim(), low, high };
    lines.push(d.kind === 'extra' ? { kind: 'extra', extra: d.extra, ...base } : { kind: d.kind, ...base });
  }
  return lines.length ? { lines } : { error: 'Add at least one line.' };
}

/** A new version of the estimate: labour as hours low–high at the workshop rate, parts expected at cost, flagged extras. */
export function EstimateForm({
  restorationId,
  settings,
  onDone,
}: {
  restorationId: number;
  settings: WorkshopSettings;
  onDone: () => void;
}) {
  const [drafts, setDrafts] = useState<Draft[]>([blank('labour'), blank('part')]);
  const [note, setNote] = useState('');
  const [error, setError] = useState('');
  const create = useCreateEstimate(restorationId);
  const set = (i: number, patch: Partial<Draft>) =>
    setDrafts((ds) => ds.map((d, j) => (j === i ? { ...d, ...patch } : d)));
  const submit = (send: boolean) => {
    const result = toLines(drafts, settings.currency);
    if ('error' in result) return setError(result.error);
    setError('');
    create.mutate({ note, send, lines: result.lines }, { onSuccess: onDone });
  };
  const rate = moneyText({ amount: settings.labourRate, currency: settings.currency });
  return (
    <form
      className="space-y-3 rounded-xl border border-rule bg-panel p-4"
      onSubmit={(ev) => {
        ev.preventDefault();
        submit(true);
      }}
      aria-label="New estimate"
    >
      <p className="text-sm text-ink-soft">
        Labour at {rate} an hour; parts at cost plus {settings.partsMarkupBasisPoints / 100}%;{' '}
        {settings.taxRateBasisPoints === null
          ? 'no tax.'
          : `${settings.taxName} ${settings.taxRateBasisPoints / 100}% added.`}{' '}
        Amounts in {settings.currency}.
      </p>
      {drafts.map((d, i) => (
        <fieldset key={i} className="grid gap-2 rounded-lg bg-sunken p-3 sm:grid-cols-[8rem_1fr_7rem_7rem_auto]">
          <legend className="sr-only">Line {i + 1}</legend>
          <select
            aria-label={`Line ${i + 1} kind`}
            className={inputClass}
            value={d.kind}
            onChange={(ev) => set(i, { kind: ev.target.value as Kind })}
          >
            <option value="labour">Labour (hours)</option>
            <option value="part">Parts (cost)</option>
            <option value="extra">Extra</option>
          </select>
          <div className="space-y-2">
            <input
              aria-label={`Line ${i + 1} description`}
              className={inputClass}
              value={d.description}
              placeholder="e.g. Recap the audio stage"
              onChange={(ev) => set(i, { description: ev.target.value })}
            />
            {d.kind === 'extra' && (
              <select
                aria-label={`Line ${i + 1} extra`}
                className={inputClass}
                value={d.extra}
                onChange={(ev) => set(i, { extra: ev.target.value as Draft['extra'] })}
              >
                <LabelledOptions values={estimateExtras} labels={estimateExtraLabels} />
              </select>
            )}
          </div>
          <input
            aria-label={`Line ${i + 1} low`}
            inputMode="decimal"
            className={inputClass}
            value={d.low}
            placeholder={d.kind === 'labour' ? 'low h' : 'low'}
            onChange={(ev) => set(i, { low: ev.target.value })}
          />
          <input
            aria-label={`Line ${i + 1} high`}
            inputMode="decimal"
            className={inputClass}
            value={d.high}
            placeholder={d.kind === 'labour' ? 'high h' : 'high'}
            onChange={(ev) => set(i, { high: ev.target.value })}
          />
          <Button
            variant="quiet"
            aria-label={`Remove line ${i + 1}`}
            onClick={() => setDrafts((ds) => ds.filter((_, j) => j !== i))}
          >
            Remove
          </Button>
        </fieldset>
      ))}
      <div className="flex flex-wrap gap-2">
        <Button variant="quiet" onClick={() => setDrafts((ds) => [...ds, blank('labour')])}>
          Add a line
        </Button>
      </div>
      <label className="block space-y-1">
        <span className="font-semibold">Note to the owner</span>
        <textarea className={inputClass} rows={2} value={note} onChange={(ev) => setNote(ev.target.value)} />
      </label>
      {(error || create.isError) && (
        <p role="alert" className="font-semibold text-danger">
          {error || create.error?.message}
        </p>
      )}
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={create.isPending}>
          {create.isPending ? 'Sending…' : 'Send to the owner'}
        </Button>
        <Button variant="quiet" onClick={() => submit(false)} disabled={create.isPending}>
          Keep as draft
        </Button>
        <Button variant="quiet" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
