import { mismatchLine } from '../../../shared/schemas/sheets';
import { formatQuantity, isOverRange, readingKinds } from '../../../shared/bench';
import { kindLabels, statusLabels } from '../../../shared/schemas/findings';
import { partActionLabels } from '../../../shared/schemas/parts';
import { viewLabels } from '../../../shared/schemas/photos';
import { equipmentKindLabels, workLevelLabels } from '../../../shared/schemas/restorations';
import { writeBringupSection } from '../bringup/bringup-report';
import { documentDate } from '../../format';
import type { ReportData } from './report.repo';
import { createWriter, type Writer } from './pdf-writer';
import { writeSafetyTestSection, writeSoakSection } from './report-safety-sections';

export const SAFETY_TEXT = [
  'Valve equipment works at lethal voltages: the HT supply is typically 200–300 V DC, and filter capacitors can stay charged after the set is switched off.',
  'Do not open the set or remove the back while it is plugged in. Only a competent person should work inside it: discharge the filter capacitors and verify with a meter first.',
  'Keep the ventilation holes clear; never cover the set while it is on.',
  'This report records the work done, the readings taken and the workshop\u2019s final safety test; it is not a certificate of electrical safety. Follow your local electrical codes, and have the set checked by a licensed professional where the law requires it.',
];

const WORK = (d: ReportData) =>
  `${workLevelLabels[d.set.workLevel]}${d.set.hiddenPartsOriginal ? ', with hidden parts kept original-looking' : ''}.`;
const reading = (m: ReportData['readings'][number]) =>
  `${readingKinds[m.quantity].label} at ${m.location}: ${isOverRange(m.readingText) ? `${m.readingText.trim()} (over range)` : formatQuantity(m.reading, readingKinds[m.quantity].unit)} — ${m.verdictReason}`;

/** The owner's hand-back report as a PDF, made on the server without a browser. */
export async function renderReport(d: ReportData): Promise<{ pdf: Buffer; pageCount: number }> {
  const w = createWriter();
  const title = `${d.set.make} ${d.set.model}${d.set.year ? ` (${d.set.year})` : ''}`;
  w.text('Hand-back report', { size: 12, colour: '#b4530b', bold: true, gap: 0.2 });
  w.text(title, { size: 26, bold: true, gap: 0.3 });
  w.text(
    `${equipmentKindLabels[d.set.equipmentKind]}${d.set.serial ? ` · serial ${d.set.serial}` : ''} · restored by ${d.technicians.map((t) => t.name).join(', ') || 'the workshop'} · ${documentDate(new Date())}`,
    { colour: '#5d5247' },
  );
  if (d.cover) await w.image(d.cover, w.width, 300).then((s) => w.doc.moveDown(s.height / 14 + 0.5));

  w.heading('The set and its story');
  if (d.set.story) w.text(d.set.story);
  if (d.set.symptoms) w.text(`As it came in: “${d.set.symptoms}”`);
  if (d.set.mainsSetting) w.text(`Mains setting: ${d.set.mainsSetting}.`);
  w.heading('The work agreed');
  w.text(WORK(d));

  w.heading('Summary');
  const repairedCount = d.findings.filter((f) => f.status === 'repaired' || f.status === 'verified').length;
  w.text(
    `${d.findings.length} findings shared with you, ${repairedCount} of them repaired. ${d.replaced.length} parts fitted; ${d.kept.length} original parts kept. ${d.readings.length + d.safetyChecks.length} readings recorded.`,
  );
  for (const f of d.findings)
    w.text(
      `#${f.number} ${f.componentRef ? `${f.componentRef} ` : ''}${f.title} — ${statusLabels[f.status]} (${kindLabels[f.kind].toLowerCase()})`,
      { size: 10, gap: 0.1 },
    );

  if (d.pairs.length) {
    w.heading('Before and after');
    for (const p of d.pairs) await pair(w, p);
  }
  if (d.repaired.length) {
    w.heading('What was repaired');
    for (const { finding: f, closeup } of d.repaired) {
      w.ensureSpace(200);
      const top = w.doc.y;
      const size = await w.image(closeup, 150, 150, { x: w.doc.page.margins.left, y: top });
      w.doc.x = w.doc.page.margins.left + 165;
      w.doc.y = top;
      w.text(`#${f.number} ${f.componentRef} ${f.title}`.replace(/\s+/g, ' '), { bold: true });
      w.text(`${kindLabels[f.kind]} · now ${statusLabels[f.status].toLowerCase()}`, { colour: '#5d5247' });
      w.doc.x = w.doc.page.margins.left;
      w.doc.y = Math.max(w.doc.y, top + size.height) + 12;
    }
  }
  w.heading('Parts replaced');
  if (!d.replaced.length) w.text('No parts are recorded as fitted yet.');
  for (const p of d.replaced)
    w.text(
      `${p.componentRef}: ${[p.originalPart, p.originalRating].filter(Boolean).join(' ') || 'original'} → ${[p.replacementPart, p.replacementRating].filter(Boolean).join(' ')} (${partActionLabels[p.action].toLowerCase()})${p.testedAfter ? `; tested after: ${p.testedAfter}` : ''}`,
      { size: 10, gap: 0.15 },
    );
  w.heading('Original parts kept');
  w.text(
    d.kept.length
      ? d.kept.map((p) => `${p.componentRef} ${p.originalPart} ${p.originalRating}`.trim()).join('; ')
      : 'None recorded separately.',
  );
  if (d.mismatches.length) {
    w.heading('Where the set differs from its service sheet');
    for (const m of d.mismatches) w.text(mismatchLine(m), { size: 10, gap: 0.15 });
  }
  w.heading('Key measurements');
  if (!d.readings.length) w.text('No readings have been shared in this report.');
  for (const m of d.readings) w.text(reading(m), { size: 10, gap: 0.15 });
  writeBringupSection(w, d.bringup);
  writeSafetyTestSection(w, d);
  writeSoakSection(w, d);
  w.heading('Final safety checks');
  if (!d.safetyChecks.length) w.text('No final insulation or leakage check is recorded in this notebook yet.');
  for (const m of d.safetyChecks) w.text(reading(m), { size: 10, gap: 0.15 });
  w.heading('Care notes');
  w.text(
    d.set.careNotes ??
      'Let the set warm up for a minute before turning the volume up, and switch it off when not listening.',
  );
  if (d.set.liveChassis)
    w.text(
      'This set has a live chassis (AC/DC): keep the back and all knobs fitted, never touch metal parts while it is plugged in, and unplug it before moving it.',
      { bold: true },
    );
  w.heading('Safety');
  for (const line of SAFETY_TEXT) w.text(line, { size: 10 });
  const pageCount = w.footer(`${title} · Gridleak hand-back report`);
  return { pdf: await w.finish(), pageCount };
}

async function pair(w: Writer, p: ReportData['pairs'][number]) {
  w.ensureSpace(230);
  w.label(viewLabels[p.view]);
  const top = w.doc.y;
  const half = (w.width - 12) / 2;
  const a = await w.image(p.before, half, 200, { x: w.doc.page.margins.left, y: top });
  const b = await w.image(p.after, half, 200, { x: w.doc.page.margins.left + half + 12, y: top });
  w.doc.y = top + Math.max(a.height, b.height) + 4;
  w.text(
    `Before${p.beforeCaption ? `: ${p.beforeCaption}` : ''}   ·   After${p.afterCaption ? `: ${p.afterCaption}` : ''}`,
    {
      size: 9,
      colour: '#5d5247',
    },
  );
}
