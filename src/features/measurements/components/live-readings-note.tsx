import { Caution, CautionLead } from '../../../components/caution';

/** The caution wherever a reading is taken on a powered set or with a test voltage applied. */
export function LiveReadingsNote() {
  return (
    <Caution className="text-sm">
      <p>
        <CautionLead>Live readings: HT can kill.</CautionLead> One hand away, insulated probes, meter rated for the
        voltage; discharge capacitors before touching; AC/DC sets may have a live chassis — use an isolation
        transformer. Follow local codes and licensed practice.
      </p>
    </Caution>
  );
}
