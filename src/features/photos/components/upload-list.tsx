import type { UploadItem } from '../lib/upload-queue';
import { UploadRow } from './upload-row';

function summary(items: readonly UploadItem[]): string {
  const count = (status: UploadItem['status']) => items.filter((i) => i.status === status).length;
  const sending = count('uploading');
  const queued = count('queued');
  if (sending || queued) return `Sending ${sending}, ${queued} queued.`;
  const failed = count('failed');
  return failed ? `${failed} not added.` : items.length ? 'Photos added.' : '';
}

export function UploadList({
  items,
  onCancel,
  onRetry,
  onRemove,
}: {
  items: readonly UploadItem[];
  onCancel: (key: string) => void;
  onRetry: (key: string) => void;
  onRemove: (key: string) => void;
}) {
  return (
    <>
      <p role="status" className="sr-only">
        {summary(items)}
      </p>
      {items.length > 0 && (
        <ul aria-label="Uploads" className="divide-y divide-rule rounded-xl border border-rule bg-panel">
          {items.map((item) => (
            <UploadRow key={item.key} item={item} onCancel={onCancel} onRetry={onRetry} onRemove={onRemove} />
          ))}
        </ul>
      )}
    </>
  );
}
