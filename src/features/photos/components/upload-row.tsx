import { useEffect, useRef } from 'react';
import { formatBytes } from '../../../lib/photo-format';
import type { UploadItem } from '../lib/upload-queue';

const smallButton = 'min-h-11 rounded-lg px-3 text-sm font-semibold hover:bg-sunken';

function Status({ item, percent }: { item: UploadItem; percent: number }) {
  switch (item.status) {
    case 'queued':
      return <span className="text-ink-soft">Queued</span>;
    case 'uploading':
      return <span>{item.loaded >= item.total && item.total > 0 ? 'Processing…' : `Sending… ${percent} %`}</span>;
    case 'added':
      return (
        <span className="font-semibold text-ok">
          <span aria-hidden="true">✓ </span>Added
        </span>
      );
    case 'cancelled':
      return <span className="text-ink-soft">Cancelled</span>;
    case 'failed':
      return (
        <span role="alert" className="font-semibold text-danger">
          <span aria-hidden="true">✕ </span>
          {item.error}
        </span>
      );
  }
}

export function UploadRow({
  item,
  onCancel,
  onRetry,
  onRemove,
}: {
  item: UploadItem;
  onCancel: (key: string) => void;
  onRetry: (key: string) => void;
  onRemove: (key: string) => void;
}) {
  const { status, file } = item;
  const percent = item.total > 0 ? Math.min(100, Math.round((item.loaded / item.total) * 100)) : 0;
  const retryRef = useRef<HTMLButtonElement>(null);
  const cancelHadFocus = useRef(false);
  // The Cancel button disappears when pressed; hand focus to Retry, which takes its place.
  useEffect(() => {
    if (status === 'cancelled' && cancelHadFocus.current) retryRef.current?.focus();
    cancelHadFocus.current = false;
  }, [status]);

  return (
    <li
      className={`space-y-1 px-3 py-2 transition-opacity duration-700 motion-reduce:transition-none ${item.leaving ? 'opacity-0' : ''}`}
    >
      <div className="flex min-w-0 items-baseline gap-2">
        <span className="min-w-0 flex-1 truncate font-semibold">{file.name}</span>
        <span className="shrink-0 font-mono text-sm text-ink-soft">{formatBytes(file.size)}</span>
      </div>
      {status === 'uploading' && (
        <progress
          max={100}
          value={percent}
          aria-label={`Upload of ${file.name}`}
          className="h-2 w-full overflow-hidden rounded-full bg-sunken accent-glow [&::-moz-progress-bar]:bg-glow [&::-webkit-progress-bar]:bg-sunken [&::-webkit-progress-value]:bg-glow"
        />
      )}
      <div className="flex flex-wrap items-center gap-x-2 text-sm">
        <span className="min-w-0 flex-1">
          <Status item={item} percent={percent} />
        </span>
        {(status === 'queued' || status === 'uploading') && (
          <button
            type="button"
            className={smallButton}
            aria-label={`Cancel upload of ${file.name}`}
            onClick={(e) => {
              cancelHadFocus.current = document.activeElement === e.currentTarget;
              onCancel(item.key);
            }}
          >
            Cancel
          </button>
        )}
        {((status === 'failed' && item.retryable) || status === 'cancelled') && (
          <button
            ref={retryRef}
            type="button"
            className={smallButton}
            aria-label={`Retry ${file.name}`}
            onClick={() => onRetry(item.key)}
          >
            Retry
          </button>
        )}
        {(status === 'failed' || status === 'cancelled') && (
          <button
            type="button"
            className={smallButton}
            aria-label={`Remove ${file.name} from the list`}
            onClick={() => onRemove(item.key)}
          >
            Remove
          </button>
        )}
      </div>
    </li>
  );
}
