import { describe, expect, it } from 'vitest';
import { isBusy, newUploadItem, nextToStart, uploadQueueReducer, type UploadItem } from './upload-queue';

const fields = { view: 'top', phase: 'before', caption: '', ownerVisible: false } as const;
const item = (key: string, status: UploadItem['status'] = 'queued'): UploadItem => ({
  ...newUploadItem(key, new File(['x'.repeat(10)], `${key}.jpg`, { type: 'image/jpeg' }), fields),
  status,
});

describe('upload queue', () => {
  it('when one is sending, then only one more may start, in the order picked', () => {
    const items = [item('a', 'uploading'), item('b', 'failed'), item('c'), item('d')];
    expect(nextToStart(items, 2).map((i) => i.key)).toEqual(['c']);
    expect(nextToStart([item('a', 'uploading'), item('b', 'uploading'), item('c')], 2)).toEqual([]);
  });

  it('when a failed upload is retried, then it is queued again from zero without its error', () => {
    let items = [item('a')];
    items = uploadQueueReducer(items, { type: 'start', key: 'a' });
    items = uploadQueueReducer(items, { type: 'progress', key: 'a', loaded: 5, total: 10 });
    items = uploadQueueReducer(items, { type: 'failed', key: 'a', error: 'Storage is down.', retryable: true });
    expect(items[0]).toMatchObject({ status: 'failed', loaded: 5, error: 'Storage is down.' });
    items = uploadQueueReducer(items, { type: 'retry', key: 'a' });
    expect(items[0]).toMatchObject({ status: 'queued', loaded: 0, error: undefined });
  });

  it('when an upload is added, then its bar reads full, and the queue is idle once nothing waits or sends', () => {
    let items = uploadQueueReducer([item('a', 'uploading'), item('b', 'cancelled')], { type: 'added', key: 'a' });
    expect(items[0]).toMatchObject({ status: 'added', loaded: 10 });
    expect(isBusy(items)).toBe(false);
    items = uploadQueueReducer(items, { type: 'remove', key: 'a' });
    expect(items.map((i) => i.key)).toEqual(['b']);
  });
});
