import {
  decisionLabels,
  prePowerItemWords,
  prePowerStatusLabels,
  supplyLabels,
  type Bringup,
} from '../../../shared/schemas/bringup';
import { documentDate as day } from '../../format';
import type { Writer } from '../report/pdf-writer';
import { readBringup } from './bringup.repo';
import type { Db } from './power-gate';

const DANGER = '#a3261b';
const SOFT = '#5d5247';

/** The bring-up record as the owner reads it (the report is the owner's document, whoever downloads it). */
export const bringupForReport = (db: Db, restorationId: number) => readBringup(db, restorationId, 'owner');

/** "Before the first switch-on": the pre-power sign-off with every item, waivers in red, and the staged power-up in brief. */
export function writeBringupSection(w: Writer, b: Bringup) {
  const { prePower, steps } = b;
  if (!prePower.signedOff && !steps.length && prePower.items.every((i) => i.status === null)) return;
  w.heading('Before the first switch-on');
  w.text(
    prePower.signedOff
      ? `The pre-power checklist was signed off by ${prePower.signedOff.by ?? 'the technician'} on ${day(prePower.signedOff.at)}.`
      : 'The pre-power checklist has not been signed off yet.',
  );
  for (const i of prePower.items) {
    const label = prePowerItemWords[i.item].ownerLabel;
    if (i.status === 'waived')
      w.text(`Waived: ${label} — ${i.reason}`, { size: 10, gap: 0.15, colour: DANGER, bold: true });
    else
      w.text(
        `${label}: ${i.status ? prePowerStatusLabels[i.status].toLowerCase() : 'not yet checked'}${i.status === 'not-applicable' ? ` (${i.reason})` : ''}`,
        { size: 10, gap: 0.15 },
      );
  }
  if (!steps.length) return;
  w.text(`The first switch-on was made in ${steps.length} step${steps.length === 1 ? '' : 's'}:`, { gap: 0.15 });
  for (const s of steps) {
    const what = [
      supplyLabels[s.supply],
      s.lampWatts !== null && `${s.lampWatts} W lamp`,
      s.appliedVolts !== null && `${s.appliedVolts} V`,
    ]
      .filter(Boolean)
      .join(', ');
    const stop = s.decision === 'stop';
    w.text(`Step ${s.number}: ${what} — ${decisionLabels[s.decision].toLowerCase()}`, {
      size: 10,
      gap: 0.15,
      colour: stop ? DANGER : undefined,
    });
  }
  w.text('A stop means a fault showed itself at that step; it was found and put right before going on.', {
    size: 9,
    colour: SOFT,
  });
}
