import { Caution, CautionLead } from '../../../components/caution';
/**
 * Shown prominently whenever the line-up, or the restoration's own flag, says the chassis may be live.
 * `announce` makes it an alert, for when it appears while a line-up is being typed. An owner reads their own words.
 */
export function LiveChassisCaution({
  reasons = [],
  announce = false,
  audience = 'workshop',
}: {
  reasons?: string[];
  announce?: boolean;
  audience?: 'workshop' | 'owner';
}) {
  if (audience === 'owner')
    return (
      <Caution look="box">
        <p>
          <CautionLead>This set may have a live chassis:</CautionLead> its metal frame can be connected to the mains.
          Use it only with its back and every knob in place, and let only a competent person open it. Follow local
          electrical codes.
        </p>
      </Caution>
    );
  return (
    <Caution look="box" role={announce ? 'alert' : 'note'} className="space-y-1">
      <p>
        <CautionLead className="text-lg">Live chassis likely:</CautionLead> series heaters mean the chassis may be
        connected to the mains. Work only through an isolation transformer; treat every metal part as live; refit
        insulating knobs and covers. Follow local codes and licensed practice.
      </p>
      {reasons.length > 0 && (
        <ul className="list-disc pl-5 text-sm">
          {reasons.map((r) => (
            <li key={r}>{r}</li>
          ))}
        </ul>
      )}
    </Caution>
  );
}
