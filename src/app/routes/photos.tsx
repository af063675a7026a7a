import { useState } from 'react';
import { useBlocker } from 'react-router';
import { ConfirmDialog, type ConfirmRequest } from '../../components/confirm-dialog';
import { PhotoLibrary } from '../../features/photos/components/photo-library';
import { useRestorationContext } from '../restoration-context';

const leaveWhileUploading: ConfirmRequest = {
  title: 'Leave while photos are uploading?',
  consequence: 'The photos still uploading are cancelled and not saved; the ones already finished stay.',
  confirmLabel: 'Leave and cancel uploads',
  cancelLabel: 'Stay here',
  danger: true,
};

export function PhotosRoute() {
  const r = useRestorationContext();
  const [uploading, setUploading] = useState(false);
  // Leaving the tab cancels uploads in flight, so ask first.
  const blocker = useBlocker(
    ({ currentLocation, nextLocation }) => uploading && currentLocation.pathname !== nextLocation.pathname,
  );
  return (
    <>
      <PhotoLibrary restorationId={r.id} role={r.role} liveChassis={r.liveChassis} onUploadBusyChange={setUploading} />
      <ConfirmDialog
        request={blocker.state === 'blocked' ? leaveWhileUploading : undefined}
        onAnswer={(yes) => (yes ? blocker.proceed?.() : blocker.reset?.())}
      />
    </>
  );
}
