import { zodResolver } from '@hookform/resolvers/zod';
import { useEffect, useId } from 'react';
import { useForm } from 'react-hook-form';
import { photoUploadFieldsSchema, type PhotoUploadFields } from '../../../../shared/schemas/photos';
import type { UploadFields } from '../api/upload-photo';
import { useUploadQueue } from '../hooks/use-upload-queue';
import { DropZone } from './drop-zone';
import { SafetyCaution } from './safety-caution';
import { UploadBatchFields } from './upload-batch-fields';
import { UploadList } from './upload-list';

/** Technicians add photos here: batch fields first, then files by drop, picker or camera. */
export function PhotoUploader({
  restorationId,
  liveChassis,
  onBusyChange,
}: {
  restorationId: number;
  liveChassis?: boolean;
  /** Told when uploads start and finish, so the page can ask before someone navigates away. */
  onBusyChange?: (busy: boolean) => void;
}) {
  const headingId = useId();
  const queue = useUploadQueue(restorationId);
  const form = useForm<PhotoUploadFields, unknown, UploadFields>({
    resolver: zodResolver(photoUploadFieldsSchema),
    defaultValues: { view: 'top', phase: 'before', caption: '', ownerVisible: false },
  });

  useEffect(() => onBusyChange?.(queue.busy), [queue.busy, onBusyChange]);
  useEffect(() => () => onBusyChange?.(false), [onBusyChange]);

  const addFiles = (files: File[]) => {
    if (files.length) void form.handleSubmit((fields) => queue.add(files, fields))();
  };

  return (
    <section aria-labelledby={headingId} className="space-y-4 rounded-xl border border-rule bg-panel p-4">
      <h2 id={headingId} className="text-lg font-bold">
        Add photos
      </h2>
      <SafetyCaution liveChassis={liveChassis} />
      <UploadBatchFields form={form} />
      <DropZone onFiles={addFiles} />
      <UploadList items={queue.items} onCancel={queue.cancel} onRetry={queue.retry} onRemove={queue.remove} />
    </section>
  );
}
