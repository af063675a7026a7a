import { useId } from 'react';
import {
  phaseLabels,
  phaseSchema,
  phases,
  viewLabels,
  viewSchema,
  views,
  type Photo,
  type PhotoPatch,
} from '../../../../shared/schemas/photos';
import { buttonClass } from '../../../components/button';
import { Field, inputClass } from '../../../components/field';
import { useUpdatePhoto } from '../api/update-photo';
import { CaptionForm } from './caption-form';
import { DeletePhoto } from './delete-photo';
import { ShareSwitch } from './share-switch';
import { LabelledOptions } from '../../../components/labelled-options';
import { FormAlert } from '../../../components/form-alert';

/** A technician's controls for one photo. Changes show at once and are put back if the server refuses them. */
export function PhotoEditPanel({
  photo,
  canDelete,
  canDownload,
  onDeleted,
}: {
  photo: Photo;
  canDelete: boolean;
  canDownload: boolean;
  onDeleted: (id: number) => void;
}) {
  const headingId = useId();
  const update = useUpdatePhoto(photo.restorationId);
  const save = (patch: PhotoPatch) => update.mutate({ id: photo.id, patch });
  return (
    <section aria-labelledby={headingId} className="space-y-4 border-t border-rule pt-4">
      <h3 id={headingId} className="font-bold">
        Edit
      </h3>
      <div className="grid grid-cols-2 gap-3">
        <Field label="View">
          {(a) => (
            <select
              {...a}
              value={photo.view}
              onChange={(e) => save({ view: viewSchema.parse(e.target.value) })}
              className={inputClass}
            >
              <LabelledOptions values={views} labels={viewLabels} />
            </select>
          )}
        </Field>
        <Field label="Phase">
          {(a) => (
            <select
              {...a}
              value={photo.phase}
              onChange={(e) => save({ phase: phaseSchema.parse(e.target.value) })}
              className={inputClass}
            >
              <LabelledOptions values={phases} labels={phaseLabels} />
            </select>
          )}
        </Field>
      </div>
      <CaptionForm caption={photo.caption} pending={update.isPending} onSave={(caption) => save({ caption })} />
      <ShareSwitch checked={photo.ownerVisible} onChange={(ownerVisible) => save({ ownerVisible })} />
      <p role="status" className="min-h-6 text-sm text-ink-soft">
        {update.isPending ? 'Saving…' : update.isSuccess ? 'Saved.' : ''}
      </p>
      {update.isError && <FormAlert small message={`That change was not saved: ${update.error.message}`} />}
      {canDownload && photo.urls.original && (
        <div className="space-y-1">
          <a href={photo.urls.original} download className={buttonClass('quiet', 'w-full')}>
            Download original
          </a>
          <p className="text-sm text-ink-soft">
            The original keeps the camera's data, including where it was taken if recorded.
          </p>
        </div>
      )}
      {canDelete && <DeletePhoto restorationId={photo.restorationId} photoId={photo.id} onDeleted={onDeleted} />}
    </section>
  );
}
