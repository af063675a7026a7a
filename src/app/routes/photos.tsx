import { useEffect, useState } from 'react';
import { useBlocker } from 'react-router';
import { PhotoLibrary } from '../../features/photos/components/photo-library';
import { useRestorationContext } from '../restoration-context';

export function PhotosRoute() {
  const r = useRestorationContext();
  const [uploading, setUploading] = useState(false);
  // Leaving the tab cancels uploads in flight, so ask first.
  const blocker = useBlocker(({ currentLocation, nextLocation }) => uploading && currentLocation.pathname !== nextLocation.pathname);
  useEffect(() => {
    if (blocker.state !== 'blocked') return;
    if (window.confirm('Photos are still uploading. Leave and cancel them?')) blocker.proceed();
    else blocker.reset();
  }, [blocker]);
  return <PhotoLibrary restorationId={r.id} role={r.role} liveChassis={r.liveChassis} onUploadBusyChange={setUploading} />;
}
