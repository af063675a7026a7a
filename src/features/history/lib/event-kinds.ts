import { readingKinds } from '../../../../shared/bench';
import { timelineKinds, type TimelineEvent } from '../../../../shared/schemas/events';

type Kind = TimelineEvent['kind'];

/**
 * What a reading judged out broke, from the kinds of reading: a band's tolerance, or a limit (an ESR's maximum, an
 * insulation's minimum, or a band's when "max"/"min" is typed as its tolerance).
 */
const rules = Object.values(readingKinds).map((k) => k.rule.type);
const judgedAgainst = [...(rules.includes('band') ? ['tolerance'] : []), 'limit'];

/** The chip's words for each kind of event, in the order the chips are shown. */
export const eventKindLabels: Record<Kind, string> = {
  'photo-added': 'Photos',
  'finding-opened': 'Findings',
  'finding-status': 'Status changes',
  'question-asked': 'Questions',
  'question-resolved': 'Answers',
  'part-fitted': 'Parts fitted',
  'stage-changed': 'Stages',
  'measurement-out': `Readings outside ${judgedAgainst.join(' or ')}`,
  'safety-test': 'Safety tests',
  'safety-override': 'Safety overrides',
  'soak-session': 'Soak runs',
  'report-sent': 'Reports sent',
  'intake-checked': 'Intake checks',
  'pre-power-set': 'Pre-power checks',
  'pre-power-signed': 'Pre-power sign-offs',
  'pre-power-voided': 'Sign-offs withdrawn',
  'bringup-step': 'Power-up steps',
  'help-requested': 'Help requests',
  'help-link-made': 'Help links made',
  'help-link-withdrawn': 'Help links withdrawn',
  'cause-checked': 'Causes checked',
  'reading-requested': 'Readings asked for',
  'reading-answered': 'Readings answered',
  'estimate-sent': 'Estimates sent',
  'estimate-decided': 'Estimate answers',
  'labour-logged': 'Time logged',
  'invoice-issued': 'Invoices issued',
  'invoice-voided': 'Invoices voided',
  'payment-received': 'Payments received',
  'payment-refunded': 'Refunds',
  'sheet-added': 'Service sheet pages',
  'reference-marked': 'References marked',
  'mismatch-noted': 'Mismatches noted',
};

export const eventKinds = timelineKinds;

/** Events about one finding: they show its close-up and link to it. */
export const findingKinds: ReadonlySet<Kind> = new Set<Kind>([
  'finding-opened',
  'finding-status',
  'question-asked',
  'question-resolved',
]);

/** How many events of each kind, for the chips' counts. */
export function countByKind(events: Pick<TimelineEvent, 'kind'>[]): Record<Kind, number> {
  const counts = Object.fromEntries(timelineKinds.map((k) => [k, 0])) as Record<Kind, number>;
  for (const e of events) counts[e.kind] += 1;
  return counts;
}
