import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactNode } from 'react';
import { createMemoryRouter, MemoryRouter, RouterProvider, useLocation, type RouteObject } from 'react-router';

/** A fresh query cache for one test: nothing shared between tests, and no retries, so an error shows at once. */
export const testQueryClient = () =>
  new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });

/** Where the memory router is now, for tests that follow a link or a navigation. */
function Location() {
  return <div data-testid="location">{useLocation().pathname}</div>;
}

interface RenderOptions {
  /** Without a router (the component has no links). */
  router?: boolean;
  /** Where the memory router starts, search included. */
  path?: string;
  /** Adds `getByTestId('location')`, showing the path the router is at. */
  showLocation?: boolean;
  /** Other pages a test navigates to, e.g. `{ path: '/restorations/:id/photos/:photoId', element: … }`: with them
   * the router is a data router (returned as `router`), and `ui` stands at every path they do not match. */
  routes?: RouteObject[];
}

/**
 * The one render helper for component tests: `ui` inside a fresh query cache and, unless `router: false`, a memory
 * router at `path`, so links and navigation work. Returns the cache (and the data router, with `routes`) with
 * Testing Library's result.
 */
export function renderWithQueries(
  ui: ReactNode,
  { router = true, path = '/', showLocation = false, routes }: RenderOptions = {},
) {
  const client = testQueryClient();
  const page = (
    <>
      {ui}
      {showLocation && <Location />}
    </>
  );
  const dataRouter = routes
    ? createMemoryRouter([...routes, { path: '*', element: page }], { initialEntries: [path] })
    : undefined;
  const tree = dataRouter ? (
    <RouterProvider router={dataRouter} />
  ) : router ? (
    <MemoryRouter initialEntries={[path]}>{page}</MemoryRouter>
  ) : (
    ui
  );
  return {
    client,
    router: dataRouter,
    ...render(<QueryClientProvider client={client}>{tree}</QueryClientProvider>),
  };
}

/** Clears the field labelled `label` and types `text` into it, as a person would; returns the field. */
export async function typeInto(label: string, text: string) {
  const user = userEvent.setup();
  const input = screen.getByLabelText(label);
  await user.clear(input);
  await user.type(input, text);
  return input;
}
