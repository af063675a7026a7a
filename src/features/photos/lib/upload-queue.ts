import type { UploadFields } from '../api/upload-photo';

export type UploadStatus = 'queued' | 'uploading' | 'added' | 'failed' | 'cancelled';

/** One file in the uploader, from the moment it is picked until its "Added" row fades away. */
export interface UploadItem {
  key: string;
  file: File;
  fields: UploadFields;
  status: UploadStatus;
  /** Request bytes sent and in all; `total` is the file size until the browser reports the real body size. */
  loaded: number;
  total: number;
  error?: string;
  /** False when sending the same file again cannot help (wrong type, too large). */
  retryable: boolean;
  /** Set shortly after "Added" so the row can fade before it is removed. */
  leaving: boolean;
}

export type UploadAction =
  | { type: 'add'; items: UploadItem[] }
  | { type: 'start'; key: string }
  | { type: 'progress'; key: string; loaded: number; total: number }
  | { type: 'added'; key: string }
  | { type: 'failed'; key: string; error: string; retryable: boolean }
  | { type: 'cancelled'; key: string }
  | { type: 'retry'; key: string }
  | { type: 'leave'; key: string }
  | { type: 'remove'; key: string };

export const newUploadItem = (key: string, file: File, fields: UploadFields): UploadItem => ({
  key,
  file,
  fields,
  status: 'queued',
  loaded: 0,
  total: file.size,
  retryable: true,
  leaving: false,
});

export function uploadQueueReducer(items: UploadItem[], action: UploadAction): UploadItem[] {
  if (action.type === 'add') return [...items, ...action.items];
  if (action.type === 'remove') return items.filter((i) => i.key !== action.key);
  const change = (patch: Partial<UploadItem> | ((item: UploadItem) => Partial<UploadItem>)) =>
    items.map((i) => (i.key === action.key ? { ...i, ...(typeof patch === 'function' ? patch(i) : patch) } : i));
  switch (action.type) {
    case 'start':
      return change({ status: 'uploading', loaded: 0, error: undefined });
    case 'progress':
      return change({ loaded: action.loaded, total: action.total });
    case 'added':
      return change((i) => ({ status: 'added', loaded: i.total }));
    case 'failed':
      return change({ status: 'failed', error: action.error, retryable: action.retryable });
    case 'cancelled':
      return change({ status: 'cancelled', error: undefined });
    case 'retry':
      return change({ status: 'queued', loaded: 0, error: undefined });
    case 'leave':
      return change({ leaving: true });
  }
}

/** The next files to start so that no more than `limit` are sending at once, in the order they were picked. */
export function nextToStart(items: readonly UploadItem[], limit: number): UploadItem[] {
  const sending = items.filter((i) => i.status === 'uploading').length;
  return items.filter((i) => i.status === 'queued').slice(0, Math.max(0, limit - sending));
}

export const isBusy = (items: readonly UploadItem[]) =>
  items.some((i) => i.status === 'queued' || i.status === 'uploading');
