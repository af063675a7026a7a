import { createBrowserRouter } from 'react-router';
import { Loading } from '../components/states';
import { AppShell } from './app-shell';
import { RequireSignIn } from './require-sign-in';
import {
  findingsLoader,
  historyLoader,
  markupLoader,
  partsLoader,
  peopleLoader,
  photosLoader,
  readingsLoader,
  restorationLoader,
} from './route-loaders';
import { RouteError } from './routes/route-error';

/**
 * A lazily loaded route module's named component (keeps each page out of the main chunk). The router calls a
 * route's `lazy` just before its loader; the module (and its chunks) is asked for one task later, so the loaders'
 * data requests are queued first and are not held behind a page's chunks for one of HTTP/1.1's six connections.
 */
const page =
  <M, K extends keyof M>(load: () => Promise<M>, name: K) =>
  async () => {
    await new Promise((resolve) => setTimeout(resolve, 0));
    return { Component: (await load())[name] as React.ComponentType };
  };

/** Pages that use the whole width of a wide screen (the app shell reads it). */
const wideScreen = { wide: true };

export const router = createBrowserRouter([
  // A read-only help link: no app shell, no session; its own fallback while its code arrives (else a console warning).
  {
    path: 'shared/help/:token',
    ErrorBoundary: RouteError,
    HydrateFallback: () => <Loading label="Loading the help request…" />,
    lazy: page(() => import('./routes/shared-help'), 'SharedHelpRoute'),
  },
  {
    Component: AppShell,
    ErrorBoundary: RouteError,
    // Drawn while the first route's code and loader arrive, instead of nothing (and a console warning).
    HydrateFallback: () => <Loading label="Loading Gridleak…" />,
    children: [
      { path: 'sign-in', lazy: page(() => import('./routes/sign-in'), 'SignInRoute') },
      { path: 'sign-up', lazy: page(() => import('./routes/sign-up'), 'SignUpRoute') },
      { path: 'reset-password/:token?', lazy: page(() => import('./routes/reset-password'), 'ResetPasswordRoute') },
      { path: 'confirm-email/:token', lazy: page(() => import('./routes/confirm-email'), 'ConfirmEmailRoute') },
      { path: 'invitations/:token', lazy: page(() => import('./routes/invitation'), 'InvitationRoute') },
      { path: 'dev/mail', lazy: page(() => import('./routes/dev-mail'), 'DevMailRoute') },
      {
        Component: RequireSignIn,
        children: [
          { index: true, lazy: page(() => import('./routes/bench'), 'BenchRoute') },
          { path: 'home', lazy: page(() => import('./routes/owner-home'), 'OwnerHomeRoute') },
          { path: 'restorations/new', lazy: page(() => import('./routes/new-restoration'), 'NewRestorationRoute') },
          {
            path: 'restorations/:id',
            loader: restorationLoader,
            lazy: page(() => import('./routes/restoration-layout'), 'RestorationLayout'),
            children: [
              { index: true, lazy: page(() => import('./routes/restoration'), 'RestorationRoute') },
              {
                path: 'photos',
                handle: wideScreen,
                loader: photosLoader,
                lazy: page(() => import('./routes/photos'), 'PhotosRoute'),
              },
              {
                path: 'photos/:photoId',
                handle: wideScreen,
                loader: markupLoader,
                lazy: page(() => import('./routes/photo-markup'), 'PhotoMarkupRoute'),
              },
              {
                path: 'photos/:photoId/findings/:findingId',
                handle: wideScreen,
                loader: markupLoader,
                lazy: page(() => import('./routes/photo-markup'), 'PhotoMarkupRoute'),
              },
              {
                path: 'findings',
                loader: findingsLoader,
                lazy: page(() => import('./routes/findings'), 'FindingsRoute'),
              },
              { path: 'bring-up', lazy: page(() => import('./routes/bringup'), 'BringupRoute') },
              {
                path: 'readings',
                loader: readingsLoader,
                lazy: page(() => import('./routes/measurements'), 'MeasurementsRoute'),
              },
              { path: 'parts', loader: partsLoader, lazy: page(() => import('./routes/parts'), 'PartsRoute') },
              { path: 'safety', lazy: page(() => import('./routes/safety'), 'SafetyRoute') },
              { path: 'money', lazy: page(() => import('./routes/money'), 'MoneyRoute') },
              { path: 'history', loader: historyLoader, lazy: page(() => import('./routes/history'), 'HistoryRoute') },
              { path: 'sheets', lazy: page(() => import('./routes/sheets'), 'SheetsRoute') },
              { path: 'sheets/:pageId', lazy: page(() => import('./routes/sheet-page'), 'SheetPageRoute') },
              {
                path: 'sheets/chassis/:photoId',
                lazy: page(() => import('./routes/sheet-page'), 'ChassisReferencesRoute'),
              },
              { path: 'references/:ref', lazy: page(() => import('./routes/reference'), 'ReferenceRoute') },
              { path: 'people', loader: peopleLoader, lazy: page(() => import('./routes/people'), 'PeopleRoute') },
              { path: 'help', lazy: page(() => import('./routes/help'), 'HelpRoute') },
            ],
          },
          { path: 'calculators', lazy: page(() => import('./routes/calculators'), 'CalculatorsRoute') },
          {
            path: 'workshop/settings',
            lazy: page(() => import('./routes/workshop-settings'), 'WorkshopSettingsRoute'),
          },
        ],
      },
      { path: '*', lazy: page(() => import('./routes/not-found'), 'NotFoundRoute') },
    ],
  },
]);
