import { Caution, CautionLead } from '../../../components/caution';
/** Cautions where the first power goes on, in the product's usual words; they defer to local codes and licensed practice. */
export function PowerUpCaution({ liveChassis }: { liveChassis: boolean }) {
  return (
    <Caution label="Power-up caution" className="space-y-1 text-sm">
      <p>
        <CautionLead>First power: HT can kill.</CautionLead> Bring the set up through a series lamp or variable
        transformer, one step at a time, ready to switch off. One hand away, insulated probes, a meter rated for the
        voltage. A lamp that glows bright and stays bright means a fault: switch off. Smoke, a hot capacitor or a
        burning smell: switch off and unplug.
      </p>
      {liveChassis && (
        <p>
          <CautionLead>Live chassis likely:</CautionLead> work only through an isolation transformer and treat every
          metal part as live.
        </p>
      )}
      <p>
        Follow local electrical codes and licensed practice; where the law limits who may work on mains equipment, it
        applies here.
      </p>
    </Caution>
  );
}

export function DischargeCaution() {
  return (
    <Caution label="Discharging caution" className="text-sm">
      <p>
        <CautionLead>Discharge before touching.</CautionLead> Never rely on bleeder resistors: discharge the reservoir
        and filter capacitors through a resistor on insulated leads (not a screwdriver), then confirm with a meter that
        they read near zero. Follow local codes and licensed practice.
      </p>
    </Caution>
  );
}
