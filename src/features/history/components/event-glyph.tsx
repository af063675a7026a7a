import type { ReactNode } from 'react';
import type { TimelineEvent } from '../../../../shared/schemas/events';

type Kind = TimelineEvent['kind'];

/** Gridleak's own line glyphs, one per kind of event, drawn on a 20-unit grid in the text colour. */
const drawings: Record<Kind, ReactNode> = {
  // A camera body with its lens.
  'photo-added': (
    <>
      <path d="M3 6.5h3l1.5-2h5l1.5 2h3v9H3Z" />
      <circle cx="10" cy="11" r="2.8" />
    </>
  ),
  // A marker pin on the chassis.
  'finding-opened': (
    <>
      <path d="M10 18s-5.5-5.2-5.5-9a5.5 5.5 0 0 1 11 0c0 3.8-5.5 9-5.5 9Z" />
      <circle cx="10" cy="9" r="1.8" />
    </>
  ),
  // A dial turned part way: the finding moved on a step.
  'finding-status': (
    <>
      <circle cx="10" cy="10" r="7" />
      <path d="M10 3v7l5 5" />
    </>
  ),
  'question-asked': (
    <>
      <path d="M3.5 4h13v9h-7l-4 3v-3h-2Z" />
      <path d="M8.3 7.2a1.8 1.8 0 1 1 2.4 1.7c-.5.2-.7.5-.7 1v.4M10 11.6v.1" />
    </>
  ),
  'question-resolved': (
    <>
      <path d="M3.5 4h13v9h-7l-4 3v-3h-2Z" />
      <path d="m7.2 8.6 2 2 3.8-3.9" />
    </>
  ),
  // A resistor's zigzag between two leads.
  'part-fitted': <path d="M1.5 10h4l1.2-3 2 6 2-6 2 6 1.2-3h4.6" />,
  // A flag on its pole: the work reached a new stage.
  'stage-changed': <path d="M5 18V3M5 4h10l-2.5 3.5L15 11H5" />,
  // A meter's scale with the needle past the mark.
  'measurement-out': (
    <>
      <path d="M3 14a7 7 0 0 1 14 0" />
      <path d="m10 14 5-5.5M13.5 5.5l1 1.6" />
    </>
  ),
  // A shield: the final safety test.
  'safety-test': <path d="M10 2.5 16 5v4.5c0 4-2.7 6.7-6 8-3.3-1.3-6-4-6-8V5Z" />,
  // The shield crossed: returned without a pass.
  'safety-override': (
    <>
      <path d="M10 2.5 16 5v4.5c0 4-2.7 6.7-6 8-3.3-1.3-6-4-6-8V5Z" />
      <path d="m7.5 7.5 5 5m0-5-5 5" />
    </>
  ),
  // A clock face: hours of running.
  'soak-session': (
    <>
      <circle cx="10" cy="10" r="7" />
      <path d="M10 6v4h3" />
    </>
  ),
  // An envelope.
  'report-sent': (
    <>
      <path d="M3 5.5h14v9H3Z" />
      <path d="m3 5.5 7 5.5 7-5.5" />
    </>
  ),
  // A clipboard with a tick: an item looked at on the bench.
  'intake-checked': (
    <>
      <path d="M5 4h10v14H5Z" />
      <path d="m7.5 11 2 2 3.5-4" />
    </>
  ),
  // A clipboard with a line: a pre-power item set.
  'pre-power-set': (
    <>
      <path d="M5 4h10v14H5Z" />
      <path d="M7.5 9h5M7.5 12.5h5" />
    </>
  ),
  // A pen's stroke under a line: the checklist signed off.
  'pre-power-signed': <path d="M3 15c2-3 3-3 4 0s2 3 4-1 3-3 6-1M3 18h14" />,
  // A struck-through line: the sign-off withdrawn.
  'pre-power-voided': <path d="M3 15c2-3 3-3 4 0s2 3 4-1 3-3 6-1M4 5l12 12" />,
  // A lamp bulb: one step of the first power-up.
  'bringup-step': (
    <>
      <path d="M7 13.5a5 5 0 1 1 6 0V15H7Z" />
      <path d="M7.5 17.5h5" />
    </>
  ),
  // A speech bubble with a question mark: asking for help.
  'help-requested': (
    <>
      <path d="M3 4h14v9H9l-4 3v-3H3Z" />
      <path d="M8.5 7a1.5 1.5 0 1 1 2 1.4c-.5.2-.5.6-.5 1.1M10 11.2v.1" />
    </>
  ),
  // A ticked box: a cause on the symptom checklist checked.
  'cause-checked': (
    <>
      <path d="M4 4h12v12H4Z" />
      <path d="M7 10l2 2 4-4" />
    </>
  ),
  // A meter needle with a question mark: a mentor asks for a reading.
  'reading-requested': (
    <>
      <path d="M3 14a7 7 0 0 1 14 0" />
      <path d="M10 14l3-5" />
      <path d="M15 3.5a1.5 1.5 0 1 1 1.5 1.5v1M16.5 8v.1" />
    </>
  ),
  // A meter needle with a tick: the reading asked for was given.
  'reading-answered': (
    <>
      <path d="M3 14a7 7 0 0 1 14 0" />
      <path d="M10 14l3-5" />
      <path d="M13 4l1.5 1.5L17.5 2.5" />
    </>
  ),
  // Two chain links: a read-only link made.
  'help-link-made': (
    <>
      <path d="M8.5 11.5l3-3" />
      <path d="M9.5 6.5l1.5-1.5a3 3 0 0 1 4 4L13.5 10.5M10.5 13.5 9 15a3 3 0 0 1-4-4l1.5-1.5" />
    </>
  ),
  // A broken chain: the link withdrawn.
  'help-link-withdrawn': (
    <>
      <path d="M9.5 6.5l1.5-1.5a3 3 0 0 1 4 4L13.5 10.5M10.5 13.5 9 15a3 3 0 0 1-4-4l1.5-1.5" />
      <path d="M4 4l12 12" />
    </>
  ),
  // A priced slip with a range bar: an estimate sent to the owner.
  'estimate-sent': (
    <>
      <path d="M5 3h10v14H5Z" />
      <path d="M7.5 7h5M7.5 13h2M11 13h1.5" />
    </>
  ),
  // A slip with a tick: the owner answered the estimate.
  'estimate-decided': (
    <>
      <path d="M5 3h10v14H5Z" />
      <path d="m7.5 10.5 2 2 3.5-4" />
    </>
  ),
  // A clock face: time logged on the set.
  'labour-logged': (
    <>
      <circle cx="10" cy="10" r="7" />
      <path d="M10 6v4l3 2" />
    </>
  ),
  // A numbered slip: an invoice, deposit request or credit note issued.
  'invoice-issued': (
    <>
      <path d="M5 3h10v14l-2.5-1.5L10 17l-2.5-1.5L5 17Z" />
      <path d="M7.5 7h5M7.5 10.5h5" />
    </>
  ),
  // The slip struck through: an invoice voided.
  'invoice-voided': (
    <>
      <path d="M5 3h10v14l-2.5-1.5L10 17l-2.5-1.5L5 17Z" />
      <path d="m4 4 12 12" />
    </>
  ),
  // A coin going in: money received.
  'payment-received': (
    <>
      <circle cx="10" cy="11" r="5.5" />
      <path d="M10 1.5v4M8 3.5l2 2 2-2" />
    </>
  ),
  // A coin coming back out: a refund.
  'payment-refunded': (
    <>
      <circle cx="10" cy="11" r="5.5" />
      <path d="M10 5.5v-4M8 3.5l2-2 2 2" />
    </>
  ),
  // A folded sheet with a zig-zag: a service sheet page added.
  'sheet-added': (
    <>
      <path d="M5 3h7l3 3v11H5Z" />
      <path d="M7 11h2l1-2 1.5 4 1-2H13" />
    </>
  ),
  // A pin with a crossbar: a reference marked on a picture.
  'reference-marked': (
    <>
      <path d="M10 17s-5-5-5-9a5 5 0 0 1 10 0c0 4-5 9-5 9Z" />
      <path d="M8 8h4" />
    </>
  ),
  // Two bars that do not line up: the chassis differs from the diagram.
  'mismatch-noted': (
    <>
      <path d="M4 7h7M9 13h7" />
      <path d="m13 4-6 12" />
    </>
  ),
};

export function EventGlyph({
  kind,
  caution = false,
  className = '',
}: {
  kind: Kind;
  caution?: boolean;
  className?: string;
}) {
  const attention = kind === 'measurement-out' || caution;
  return (
    <span
      aria-hidden="true"
      className={`inline-flex h-9 w-9 shrink-0 items-center justify-center rounded-full border ${attention ? 'border-danger/50 bg-danger-soft text-danger' : 'border-rule bg-sunken text-ink-soft'} ${className}`}
    >
      <svg
        viewBox="0 0 20 20"
        className="h-5 w-5"
        fill="none"
        stroke="currentColor"
        strokeWidth={1.6}
        strokeLinecap="round"
        strokeLinejoin="round"
      >
        {drawings[kind]}
      </svg>
    </span>
  );
}
