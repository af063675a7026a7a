import { createBrowserRouter } from 'react-router';
import { AppShell } from './app-shell';
import { RouteError } from './routes/route-error';

export const router = createBrowserRouter([
  {
    Component: AppShell,
    ErrorBoundary: RouteError,
    children: [
      { index: true, lazy: async () => ({ Component: (await import('./routes/bench')).BenchRoute }) },
      { path: 'restorations/new', lazy: async () => ({ Component: (await import('./routes/new-restoration')).NewRestorationRoute }) },
      { path: 'restorations/:id', lazy: async () => ({ Component: (await import('./routes/restoration')).RestorationRoute }) },
      { path: 'dev/mail', lazy: async () => ({ Component: (await import('./routes/dev-mail')).DevMailRoute }) },
      { path: '*', lazy: async () => ({ Component: (await import('./routes/not-found')).NotFoundRoute }) },
    ],
  },
]);
