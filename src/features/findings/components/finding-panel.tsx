import { useId } from 'react';
import { can, roleLabels, type Role } from '../../../../shared/permissions';
import type { Finding, FindingPatch } from '../../../../shared/schemas/findings';
import { buttonClass } from '../../../components/button';
import { useConfirm } from '../../../components/use-confirm';
import { useDeleteFinding } from '../api/delete-finding';
import { usePhotoFindings } from '../api/get-photo-findings';
import { useUpdateFinding } from '../api/update-finding';
import { FindingCaution } from './finding-caution';
import { needsCaution, withPatch } from './finding-edit';
import { FindingFields, FindingSummary } from './finding-fields';
import { fullTime, relativeTime, type FindingMember } from './finding-format';
import { FindingHistory } from './finding-history';
import { OpenQuestionBadge, QuestionToggle, ShareWithOwner } from './finding-sharing';
import { SeverityMark, StatusMark } from '../../../components/status-mark';
import { OnTheDiagramLink } from '../../../components/on-the-diagram-link';
import { FormAlert } from '../../../components/form-alert';

export interface FindingPanelProps {
  finding: Finding;
  role: Role;
  meId: number;
  restorationId: number;
  members: FindingMember[];
  onDeleted?: () => void;
}

/**
 * One finding beside its photo. It shows the finding as the photo's list holds it — the list the canvas draws —
 * so a change shows at once in both, and a refusal rolls back in both with the server's words here.
 */
export function FindingPanel({ finding, role, meId, restorationId, members, onDeleted }: FindingPanelProps) {
  const headingId = useId();
  const list = usePhotoFindings(finding.photoId);
  const update = useUpdateFinding(finding.photoId, restorationId);
  const remove = useDeleteFinding(finding.photoId, restorationId);
  const { confirm, dialog } = useConfirm();

  const cached = list.data?.find((f) => f.id === finding.id);
  const live = cached && cached.updatedAt >= finding.updatedAt ? cached : finding;
  const pending = update.isPending && update.variables.id === finding.id ? update.variables.patch : undefined;
  const shown = withPatch(live, pending);

  const isAuthor = shown.authorId !== null && shown.authorId === meId;
  const canEdit = can(role, 'findings.edit', { isAuthor });
  const canDelete = can(role, 'findings.delete', { isAuthor });
  const workshop = can(role, 'workshop.view');
  const author = members.find((m) => m.userId === shown.authorId);
  const error = update.error ?? remove.error;

  const save = (patch: FindingPatch) => update.mutate({ id: finding.id, patch });
  const confirmDelete = async () => {
    const yes = await confirm({
      title: `Delete finding #${shown.number}, “${shown.title}”?`,
      consequence: 'Its thread and history are deleted with it.',
      confirmLabel: 'Delete finding',
      danger: true,
    });
    if (yes) remove.mutate(finding.id, { onSuccess: () => onDeleted?.() });
  };

  return (
    <section aria-labelledby={headingId} className="space-y-4">
      <header className="space-y-1">
        <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
          <span className="font-mono text-lg font-bold">#{shown.number}</span>
          <StatusMark status={shown.status} />
          <SeverityMark severity={shown.severity} />
          {shown.componentRef && <span className="font-mono font-semibold">{shown.componentRef}</span>}
          {shown.componentRef && (
            <OnTheDiagramLink restorationId={restorationId} text={shown.componentRef} from={{ finding: shown.id }} />
          )}
          {workshop && shown.questionOpen && <OpenQuestionBadge />}
        </div>
        <h2 id={headingId} className="text-xl font-bold break-words">
          {shown.title}
        </h2>
        <p className="text-sm text-ink-soft">
          Placed by {shown.authorName ?? 'a former member'}
          {author && ` (${roleLabels[author.role]})`} ·{' '}
          <time dateTime={shown.createdAt} title={fullTime(shown.createdAt)}>
            {relativeTime(shown.createdAt)}
          </time>
          {role !== 'owner' && (shown.ownerVisible ? ' · shared with the owner' : ' · team only')}
        </p>
      </header>

      {canEdit ? <FindingFields finding={shown} onSave={save} /> : <FindingSummary finding={shown} />}

      {shown.status === 'dismissed' && shown.dismissReason && (
        <p className="rounded-lg bg-sunken px-3 py-2 text-sm">
          <span className="font-semibold">Dismissed because:</span> {shown.dismissReason}
        </p>
      )}

      {needsCaution(shown) && <FindingCaution audience={workshop ? 'workshop' : 'owner'} />}

      {error && <FormAlert small message={error.message} />}

      {can(role, 'findings.share') && <ShareWithOwner checked={shown.ownerVisible} onSave={save} />}

      {workshop && (
        <div className="flex flex-wrap gap-2">
          <QuestionToggle
            open={shown.questionOpen}
            canAsk={can(role, 'findings.ask')}
            canResolve={can(role, 'findings.resolve')}
            onSave={save}
          />
          {canDelete && (
            <button
              type="button"
              className={buttonClass('quiet', 'text-danger')}
              disabled={remove.isPending}
              onClick={() => void confirmDelete()}
            >
              Delete finding
            </button>
          )}
        </div>
      )}

      <FindingHistory findingId={finding.id} />
      {dialog}
    </section>
  );
}
