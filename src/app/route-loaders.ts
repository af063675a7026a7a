import type { EnsureQueryDataOptions, QueryKey } from '@tanstack/react-query';
import type { LoaderFunctionArgs } from 'react-router';
import { meQueryOptions } from '../features/auth/api/get-me';
import { photoFindingsQueryOptions } from '../features/findings/api/get-photo-findings';
import { restorationFindingsQueryOptions } from '../lib/queries/get-restoration-findings';
import { eventsQueryOptions } from '../features/history/api/get-events';
import { measurementsQueryOptions } from '../features/measurements/api/get-measurements';
import { valvesQueryOptions } from '../features/measurements/api/get-valves';
import { membersQueryOptions } from '../features/members/api/get-members';
import { partsQueryOptions } from '../features/parts/api/get-parts';
import { photosQueryOptions } from '../lib/queries/get-photos';
import { restorationQueryOptions } from '../features/restorations/api/get-restoration';
import { queryClient } from '../lib/query-client';
import { probablySignedIn } from '../lib/signed-in-hint';

/**
 * Route loaders start a page's data as soon as the route is known, in parallel with each other and with the
 * route's code, instead of each component asking only once its parent has drawn. They never hold the
 * navigation: each fetch lands in the query cache, and the components show its loading and error states.
 */
type Start = (id: number, params: LoaderFunctionArgs['params']) => void;
function start<T, K extends QueryKey>(options: EnsureQueryDataOptions<T, Error, T, K>) {
  void queryClient.ensureQueryData(options).catch(() => {});
}

/**
 * Starts a page's data once someone is known to be signed in: a signed-out visit asks for nothing it would be
 * refused. When this tab saw the session signed in lately, the data starts together with the sign-in check
 * instead of a round trip later (`probablySignedIn`).
 */
const loader =
  (begin: Start) =>
  ({ params }: LoaderFunctionArgs) => {
    const id = Number(params.id);
    if (!Number.isInteger(id) || id <= 0) return null;
    if (probablySignedIn()) {
      start(meQueryOptions());
      begin(id, params);
    } else {
      void queryClient.ensureQueryData(meQueryOptions()).then(
        (me) => me && begin(id, params),
        () => {},
      );
    }
    return null;
  };

/** Asks the browser for an image now, so the markup canvas finds it in the cache. */
function preloadImage(url: string) {
  const img = new Image();
  img.decoding = 'async';
  img.src = url;
}

export const restorationLoader = loader((id) => start(restorationQueryOptions(id)));
export const photosLoader = loader((id) => {
  start(photosQueryOptions(id));
  // A photo is the likely next step from the grid: its canvas's code (the same chunk the router loads) comes ahead of the click.
  void import('./routes/photo-markup').catch(() => {});
});
export const findingsLoader = loader((id) => start(restorationFindingsQueryOptions(id)));
export const readingsLoader = loader((id) => {
  start(measurementsQueryOptions(id));
  start(valvesQueryOptions(id));
});
export const partsLoader = loader((id) => start(partsQueryOptions(id)));
export const historyLoader = loader((id) => start(eventsQueryOptions(id)));
export const peopleLoader = loader((id) => start(membersQueryOptions(id)));

/** The markup page: the photo list (then its display image), the photo's findings, who I am and the members, together. */
export const markupLoader = loader((id, params) => {
  const photoId = Number(params.photoId);
  start(meQueryOptions());
  start(membersQueryOptions(id));
  if (Number.isInteger(photoId) && photoId > 0) start(photoFindingsQueryOptions(photoId));
  void queryClient.ensureQueryData(photosQueryOptions(id)).then(
    (photos) => {
      const photo = photos.find((p) => p.id === photoId);
      if (photo) preloadImage(photo.urls.display);
    },
    () => {},
  );
});
