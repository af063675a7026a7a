import type { Photo } from '../../../../shared/schemas/photos';
import { apiError, fakeApi, ok } from '../../../testing/fake-api';
import { fakeRows, idAtEnd } from '../../../testing/fake-rows';

/**
 * Stands in for the API behind `fetch`: the photo list answers GET, PATCH merges, DELETE removes.
 * Every call is recorded so tests can check what was sent.
 */
export function fakePhotoApi(initial: Photo[], { failList = false } = {}) {
  const photos = fakeRows<Photo, Photo>(initial, { remake: (photo, change) => ({ ...photo, ...change }) });
  const api = fakeApi(({ method, path, body }) => {
    if (path.endsWith('/photos') && method === 'GET')
      return failList ? apiError(500, 'The photo store is not answering.') : ok(photos.list());
    if (/^\/photos\/\d+$/.test(path) && method === 'PATCH') return photos.change(idAtEnd(path), body as Partial<Photo>);
    if (/^\/photos\/\d+$/.test(path) && method === 'DELETE') return photos.remove(idAtEnd(path));
    return undefined;
  });
  return { calls: api.urlCalls, fetchMock: api.fetchMock };
}
