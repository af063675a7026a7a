import { Caution, CautionLead } from '../../../components/caution';

/** The caution where the final safety test is done: test voltages, discharging, live chassis; a record, not a certificate. */
export function SafetyTestCaution() {
  return (
    <Caution className="text-sm">
      <p>
        <CautionLead>Safety test: HT can kill.</CautionLead> Unplug the set and discharge the filter capacitors through
        a resistor, then check with a meter, before you connect the tester. The 500 V DC insulation test is itself a
        shock hazard: keep hands clear while it runs, and discharge again after. AC/DC sets may have a live chassis —
        use an isolation transformer when powered. This records the workshop’s test; it is not a certificate. Follow
        local electrical codes and licensed practice.
      </p>
    </Caution>
  );
}

/** The caution beside a soak run: a powered set left running. */
export function SoakCaution() {
  return (
    <Caution className="text-sm">
      <p>
        <CautionLead>Soak run: the set is live.</CautionLead> Stay within sight and smell of it, back fitted, clear of
        anything that burns, on a fused supply; switch off at once on smoke, a burning smell or a glowing anode. Follow
        local codes and licensed practice.
      </p>
    </Caution>
  );
}
