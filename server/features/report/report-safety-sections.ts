import { equipmentClassLabels, formatQuantity } from '../../../shared/bench';
import { specificationLabels, type SafetyLineView } from '../../../shared/schemas/safety';
import { documentDate as when } from '../../format';
import type { ReportData } from './report.repo';
import type { Writer } from './pdf-writer';

const DANGER = '#a3261b';
const OK = '#0b6e4f';
const SOFT = '#5d5247';
const verdictWords: Record<SafetyLineView['verdict'], string> = {
  pass: 'PASS',
  fail: 'FAIL',
  'not-applicable': 'not applicable',
  'not-measured': 'not measured',
};

// The report's fonts have no ≤ or ≥, and words read better to an owner anyway.
const limitWords = (text: string) => text.replace(/^≤ /, 'at most ').replace(/^≥ /, 'at least ');

function lineText(l: SafetyLineView): string {
  const value = l.value === null ? '' : `: ${formatQuantity(l.value, l.unit || 'A')}`;
  if (l.sense === 'check') return `${l.label} — ${verdictWords[l.verdict] === 'PASS' ? 'yes' : 'NO'} (${l.source})`;
  return `${l.label}${value} — ${verdictWords[l.verdict]} (limit ${limitWords(l.limitText)}; ${l.source})`;
}

/** The final safety test as judged when it was recorded, line by line with its limit and source; never called a certificate. */
export function writeSafetyTestSection(w: Writer, d: ReportData): void {
  const { latest, override } = d.safety;
  w.heading('Final safety test');
  if (!latest) w.text('No final safety test is recorded for this set.', { bold: true, colour: DANGER });
  if (latest) {
    w.text(
      `${when(latest.testedAt)}${latest.testedBy ? `, by ${latest.testedBy}` : ''} · ${equipmentClassLabels[latest.equipmentClass]}`,
      {
        colour: SOFT,
      },
    );
    w.text(latest.verdict === 'pass' ? 'Result: passed on every line tested.' : 'Result: NOT PASSED.', {
      bold: true,
      colour: latest.verdict === 'pass' ? OK : DANGER,
    });
    for (const l of latest.lines)
      w.text(lineText(l), { size: 9.5, gap: 0.15, colour: l.verdict === 'fail' ? DANGER : undefined });
    w.text(`${specificationLabels[latest.specification]}${latest.modifications ? `: ${latest.modifications}` : '.'}`, {
      size: 10,
    });
  }
  if (override)
    w.text(
      `Returned without a passing safety test, on the technician's override (${override.by ?? 'a technician'}, ${when(override.at)}): ${override.reason}`,
      { bold: true, colour: DANGER },
    );
  w.text(
    'These are the workshop\u2019s own readings against the limits shown; they are a record of the test, not a certificate of electrical safety.',
    { size: 9, colour: SOFT },
  );
}

/** Soak hours in total and each run, with what was seen. */
export function writeSoakSection(w: Writer, d: ReportData): void {
  const { soakHours, soakSessions } = d.safety;
  w.heading('Soak test');
  if (!soakSessions.length) {
    w.text('No soak run is recorded.');
    return;
  }
  w.text(`${soakHours.toFixed(1)} hours in ${soakSessions.length} run${soakSessions.length === 1 ? '' : 's'}.`);
  for (const s of soakSessions) {
    const temps = [
      s.ambientC !== null && `room ${s.ambientC} °C`,
      s.chassisC !== null && `chassis ${s.chassisC} °C`,
      s.mainsCurrentAmps !== null && `mains ${formatQuantity(s.mainsCurrentAmps, 'A')}`,
    ]
      .filter(Boolean)
      .join(', ');
    w.text(
      `${when(s.startedAt)}: ${(s.hours ?? 0).toFixed(1)} h${temps ? ` (${temps})` : ''}${s.faults ? ` — fault: ${s.faults}${s.actionTaken ? `; ${s.actionTaken}` : ''}` : ' — no fault seen'}`,
      { size: 10, gap: 0.15 },
    );
  }
}
