import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useReducer, useRef } from 'react';
import type { Photo } from '../../../../shared/schemas/photos';
import { ApiError } from '../../../lib/api-client';
import { ME_KEY } from '../../../lib/session-key';
import { photosQueryKey } from '../../../lib/queries/get-photos';
import { uploadPhoto, type UploadFields } from '../api/upload-photo';
import { isAcceptedImage } from '../../../lib/photo-format';
import { isBusy, newUploadItem, nextToStart, uploadQueueReducer, type UploadItem } from '../lib/upload-queue';

/** Two at a time: enough to keep a phone's uplink busy without starving the first photo of bandwidth. */
const CONCURRENCY = 2;
const ADDED_SHOWN_MS = 1500;
const FADE_MS = 700;

/** The uploader's queue: picks files, sends at most two at once, cancels, retries, and clears finished rows. */
export function useUploadQueue(restorationId: number) {
  const client = useQueryClient();
  const [items, dispatch] = useReducer(uploadQueueReducer, []);
  const controllers = useRef(new Map<string, AbortController>());
  const timers = useRef(new Set<ReturnType<typeof setTimeout>>());
  const nextKey = useRef(0);
  const addedSinceRefresh = useRef(false);
  const busy = isBusy(items);

  const later = useCallback((fn: () => void, ms: number) => {
    const timer = setTimeout(() => {
      timers.current.delete(timer);
      fn();
    }, ms);
    timers.current.add(timer);
  }, []);

  const start = useCallback(
    (item: UploadItem) => {
      const { key } = item;
      const controller = new AbortController();
      controllers.current.set(key, controller);
      dispatch({ type: 'start', key });
      uploadPhoto(restorationId, item.file, item.fields, {
        signal: controller.signal,
        onProgress: ({ loaded, total }) => dispatch({ type: 'progress', key, loaded, total }),
      }).then(
        (photo) => {
          controllers.current.delete(key);
          // Show it in the gallery at once; the list itself is refetched when the whole batch is done.
          client.setQueryData<Photo[]>(photosQueryKey(restorationId), (list) =>
            list && photo && !list.some((p) => p.id === photo.id) ? [...list, photo] : list,
          );
          addedSinceRefresh.current = true;
          dispatch({ type: 'added', key });
          later(() => dispatch({ type: 'leave', key }), ADDED_SHOWN_MS);
          later(() => dispatch({ type: 'remove', key }), ADDED_SHOWN_MS + FADE_MS);
        },
        (error: unknown) => {
          controllers.current.delete(key);
          if (error instanceof ApiError && error.code === 'aborted') return dispatch({ type: 'cancelled', key });
          if (error instanceof ApiError && error.status === 401) client.setQueryData(ME_KEY, null);
          const status = error instanceof ApiError ? error.status : 0;
          const message = error instanceof Error ? error.message : 'The upload failed.';
          dispatch({ type: 'failed', key, error: message, retryable: status !== 413 && status !== 415 });
        },
      );
    },
    [client, later, restorationId],
  );

  useEffect(() => {
    for (const item of nextToStart(items, CONCURRENCY)) if (!controllers.current.has(item.key)) start(item);
  }, [items, start]);

  // One refetch per batch rather than one per photo: each refetch signs every URL afresh.
  useEffect(() => {
    if (busy || !addedSinceRefresh.current) return;
    addedSinceRefresh.current = false;
    void client.invalidateQueries({ queryKey: photosQueryKey(restorationId) });
  }, [busy, client, restorationId]);

  useEffect(() => {
    if (!busy) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [busy]);

  // Leaving the page ends what is in flight rather than leaving requests nobody watches.
  useEffect(() => {
    const running = controllers.current;
    const pending = timers.current;
    return () => {
      running.forEach((c) => c.abort());
      pending.forEach(clearTimeout);
    };
  }, []);

  const add = useCallback((files: readonly File[], fields: UploadFields) => {
    const fresh = files.map((file) => {
      const item = newUploadItem(`upload-${++nextKey.current}`, file, fields);
      if (isAcceptedImage(file)) return item;
      const error = 'Not a photo Gridleak accepts. Use JPEG, PNG, WebP, HEIC or AVIF.';
      return { ...item, status: 'failed' as const, error, retryable: false };
    });
    dispatch({ type: 'add', items: fresh });
  }, []);

  const cancel = useCallback((key: string) => {
    const controller = controllers.current.get(key);
    if (controller) controller.abort();
    else dispatch({ type: 'cancelled', key });
  }, []);
  const retry = useCallback((key: string) => dispatch({ type: 'retry', key }), []);
  const remove = useCallback((key: string) => dispatch({ type: 'remove', key }), []);

  return { items, busy, add, cancel, retry, remove };
}
