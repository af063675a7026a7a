import { Caution, CautionLead } from '../../../components/caution';
/** The standing reminder on the owner's page; a live-chassis set gets its own note beside it (`LiveChassisNote`). */
export function SafetyReminder() {
  return (
    <aside aria-label="Safety" className="flex gap-3 rounded-xl border border-rule bg-panel p-4 text-sm">
      <svg
        viewBox="0 0 20 20"
        aria-hidden="true"
        className="mt-0.5 h-5 w-5 shrink-0 text-glow"
        fill="none"
        stroke="currentColor"
        strokeWidth={1.8}
        strokeLinejoin="round"
      >
        <path d="M10 2.5 18 17H2Z" />
        <path d="M10 8v4.2M10 14.4v.1" strokeLinecap="round" />
      </svg>
      <p>
        Valve sets work at lethal voltages inside: keep the back on and let only a competent person open it. Follow
        local electrical codes.
      </p>
    </aside>
  );
}

/** For sets whose chassis can be connected straight to the mains (many AC/DC sets). */
export function LiveChassisNote() {
  return (
    <Caution look="box" className="text-sm">
      <p>
        <CautionLead>This set has a live chassis.</CautionLead> Its metal frame can be connected to the mains, so use it
        only with its back and every knob in place, and ask a competent repairer before connecting anything else to it.
      </p>
    </Caution>
  );
}
