import { createHash } from 'node:crypto';
import type { HandBackWarning, ReportPreview, ReportSend, ReportSent } from '../../../shared/schemas/safety';
import { stageLabels, stages, type Stage } from '../../../shared/schemas/restorations';
import type { AppDeps } from '../../app-deps';
import { unitOfWork } from '../../db/unit-of-work';
import { ConflictError, NotFoundError } from '../../http/errors';
import { recordEvent } from '../events/record-event';
import { buildReport } from '../report/report.routes';
import { safetyTestsService } from './safety-tests.service';
import { soakService } from './soak.service';
import { safetyRepo } from './safety.repo';

type Deps = Pick<AppDeps, 'db' | 'storage' | 'mailer' | 'config'>;
const beforeTesting = new Set<Stage>(stages.slice(0, stages.indexOf('testing')).concat('on-hold'));

/** Why sending now may be premature, in words the technician can act on. */
export async function handBackWarnings(db: Deps['db'], restorationId: number): Promise<HandBackWarning[]> {
  const repo = safetyRepo(db);
  const stage = await repo.stage(restorationId);
  if (!stage) throw new NotFoundError();
  const warnings: HandBackWarning[] = [];
  if (beforeTesting.has(stage))
    warnings.push({
      code: 'stage-before-testing',
      message: `The set is still at ${stageLabels[stage]}: the report is meant for the end of Testing or later.`,
    });
  const open = await repo.openQuestions(restorationId);
  if (open.length)
    warnings.push({
      code: 'open-questions',
      message: `${open.length} question${open.length === 1 ? ' is' : 's are'} still open for the mentors (${open.map((f) => `#${f.number}`).join(', ')}).`,
    });
  const safety = await safetyTestsService(db).status(restorationId);
  if (safety.latest?.verdict !== 'pass') {
    warnings.push({
      code: 'no-passing-safety-test',
      message: safety.latest
        ? 'The latest final safety test failed; the report shows it as not passed.'
        : 'No final safety test is recorded; the report says so.',
    });
    if (safety.override)
      warnings.push({
        code: 'safety-override',
        message: `The set is returned on an override; the report shows it in red: “${safety.override.reason}”.`,
      });
  }
  const soak = await soakService(db).log(restorationId);
  if (!soak.sessions.some((s) => s.endedAt))
    warnings.push({
      code: 'no-soak',
      message: 'No soak run is recorded: new valves and old capacitors often fail in the first hours.',
    });
  return warnings;
}

/** The hand-back e-mail: preview what the owner receives, then send it and record who sent what, when. */
export function handBackService(deps: Deps) {
  const { db } = deps;
  const repo = safetyRepo(db);
  const owners = (id: number) => repo.owners(id);
  const letter = (id: number, owner: string, sender: string, set: { make: string; model: string }) => ({
    subject: `Your ${set.make} ${set.model}: the hand-back report`,
    body: `Hello ${owner},\n\n${sender} has finished the report on your ${set.make} ${set.model}; it is attached.\nYou can also read its history at ${deps.config.publicOrigin}/restorations/${id}.\n\nPlease read the safety notes at the end before using the set. The report records the work and the workshop's final safety test; it is not a certificate of electrical safety.\n\n— Gridleak, the restoration notebook`,
  });
  async function sends(id: number): Promise<ReportSend[]> {
    const rows = await repo.sends(id);
    return rows.map(({ s, by }) => ({
      id: s.id,
      sentAt: s.sentAt.toISOString(),
      sentBy: by,
      recipients: s.recipients,
      attachmentName: s.attachmentName,
      pageCount: s.pageCount,
      sha256: s.sha256,
      warnings: s.warnings,
    }));
  }
  return {
    async preview(id: number, senderName: string): Promise<ReportPreview> {
      const [report, recipients, warnings] = await Promise.all([
        buildReport(deps, id),
        owners(id),
        handBackWarnings(db, id),
      ]);
      if (!recipients.length)
        warnings.push({
          code: 'no-owner',
          message: 'No owner is on this restoration yet: invite them from the People tab first.',
        });
      const { subject, body } = letter(id, recipients[0]?.name ?? 'the owner', senderName, report.set);
      return {
        recipients,
        subject,
        body,
        attachmentName: report.name,
        pageCount: report.pageCount,
        warnings,
        sends: await sends(id),
      };
    },
    /** Sends to every owner, then records the send (with the warnings shown) and its history line in one transaction. */
    async send(id: number, sender: { id: number; name: string }): Promise<ReportSent> {
      const recipients = await owners(id);
      if (!recipients.length)
        throw new ConflictError('No owner is on this restoration yet: invite them from the People tab first.');
      const [report, warnings] = await Promise.all([buildReport(deps, id), handBackWarnings(db, id)]);
      for (const o of recipients) {
        const { subject, body } = letter(id, o.name, sender.name, report.set);
        await deps.mailer.send({
          to: o.email,
          subject,
          text: body,
          attachments: [{ filename: report.name, content: report.pdf, contentType: 'application/pdf' }],
        });
      }
      const sha256 = createHash('sha256').update(report.pdf).digest('hex');
      const sentTo = recipients.map((o) => o.email);
      const send = await unitOfWork(db, async (tx) => {
        const row = await safetyRepo(tx).insertSend({
          restorationId: id,
          sentById: sender.id,
          recipients: sentTo,
          attachmentName: report.name,
          pageCount: report.pageCount,
          sha256,
          warnings: warnings.map((w) => w.message),
          stage: report.set.stage,
        });
        await recordEvent(tx, {
          restorationId: id,
          kind: 'report-sent',
          actorId: sender.id,
          data: { reportSendId: row.id, warnings: warnings.length },
        });
        return row;
      });
      return { sentTo, sendId: send.id, warnings: warnings.map((w) => w.message) };
    },
  };
}
