import { useState } from 'react';
import type { Estimate } from '../../../../shared/schemas/estimates';
import { Button } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useDecideEstimate } from '../api/estimates';
import { rangeText } from './money-text';

/** The owner approves or declines the version they are reading, signing with their name. */
export function EstimateDecision({ restorationId, estimate }: { restorationId: number; estimate: Estimate }) {
  const [name, setName] = useState('');
  const [missing, setMissing] = useState(false);
  const decide = useDecideEstimate(restorationId);
  const answer = (decision: 'approved' | 'declined') => {
    if (!name.trim()) return setMissing(true);
    decide.mutate({ estimateId: estimate.id, decision, name: name.trim(), version: estimate.version });
  };
  return (
    <form
      className="space-y-3 rounded-lg bg-sunken p-3"
      onSubmit={(ev) => {
        ev.preventDefault();
        answer('approved');
      }}
    >
      <p>
        Approving version {estimate.version} lets the workshop go ahead within {rangeText(estimate.low, estimate.high)}.
        If the work looks like going past the high figure, the workshop sends a revised estimate first.
      </p>
      <Field
        label="Your name"
        hint="Recorded with your answer, the time and the version."
        error={missing ? 'Type your name to answer.' : undefined}
      >
        {(props) => (
          <input
            {...props}
            className={inputClass}
            value={name}
            autoComplete="name"
            onChange={(ev) => {
              setName(ev.target.value);
              setMissing(false);
            }}
          />
        )}
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={decide.isPending}>
          Approve version {estimate.version}
        </Button>
        <Button variant="quiet" onClick={() => answer('declined')} disabled={decide.isPending}>
          Decline
        </Button>
      </div>
      {decide.isError && (
        <p role="alert" className="font-semibold text-danger">
          {decide.error.message}
        </p>
      )}
    </form>
  );
}
