import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { ReactNode } from 'react';
import { MemoryRouter } from 'react-router';

/** A fresh query cache for one test: nothing shared between tests, and no retries, so an error shows at once. */
export const testQueryClient = () =>
  new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });

/**
 * The one render helper for component tests: `ui` inside a fresh query cache and, unless `router: false`, a memory
 * router at `path` (links and navigation work). Returns the cache with Testing Library's result.
 */
export function renderWithQueries(
  ui: ReactNode,
  { router = true, path = '/' }: { router?: boolean; path?: string } = {},
) {
  const client = testQueryClient();
  const tree = router ? <MemoryRouter initialEntries={[path]}>{ui}</MemoryRouter> : ui;
  return { client, ...render(<QueryClientProvider client={client}>{tree}</QueryClientProvider>) };
}

/** Clears the field labelled `label` and types `text` into it, as a person would; returns the field. */
export async function typeInto(label: string, text: string) {
  const user = userEvent.setup();
  const input = screen.getByLabelText(label);
  await user.clear(input);
  await user.type(input, text);
  return input;
}
