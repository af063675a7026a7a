// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { NEXT_CURSOR_HEADER } from '../../../shared/schemas/pagination';
import { fakeApi, ok } from '../../testing/fake-api';
import { renderWithQueries } from '../../testing/render';
import { makeRestoration } from '../../testing/restoration-fixtures';
import { BenchRoute } from './bench';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

// Sets from the invented workshop.
const set = (id: number, model: string) => makeRestoration(id, { model });

function showBench() {
  renderWithQueries(<BenchRoute />);
}

describe('the bench in pages', () => {
  it('when the bench has a further page, then "Show more sets" fetches it with the cursor and its sets join the columns', async () => {
    const api = fakeApi(({ path }) => {
      if (path === '/restorations') return { ...ok([set(1, 'Merlin')]), headers: { [NEXT_CURSOR_HEADER]: 'page-2' } };
      if (path === '/restorations?cursor=page-2') return ok([set(2, 'Osprey')]);
      if (path === '/questions' || path === '/help-requests' || path === '/activity') return ok([]);
      return undefined;
    });
    showBench();
    expect(await screen.findByText(/Merlin/)).toBeInTheDocument();
    expect(screen.queryByText(/Osprey/)).not.toBeInTheDocument();
    await userEvent.click(screen.getByRole('button', { name: 'Show more sets' }));
    expect(await screen.findByText(/Osprey/)).toBeInTheDocument();
    expect(screen.getByText(/Merlin/)).toBeInTheDocument();
    expect(api.calls.map((c) => c.path)).toContain('/restorations?cursor=page-2');
    // The last page names no next one: the button goes.
    expect(screen.queryByRole('button', { name: 'Show more sets' })).not.toBeInTheDocument();
  });
});
