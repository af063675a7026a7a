import { Caution, CautionLead } from '../../../components/caution';
/** Shown while a capacitor is being replaced: the cautions a restorer repeats before every recap. */
export function RecapCaution() {
  return (
    <Caution look="box" className="text-sm">
      <p>
        <CautionLead>Before you unsolder:</CautionLead> Discharge the filter capacitors and verify with a meter before
        unsoldering; never lower a voltage rating; use X/Y-class safety capacitors where the mains connects. Follow
        local codes and licensed practice.
      </p>
    </Caution>
  );
}
