// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { makeMeasurement, volts } from '../testing/measurement-fixtures';
import { fakeReadingsApi } from '../testing/measurement-test-support';
import { renderWithQueries } from '../../../testing/render';
import { MeasurementsForFinding } from './measurements-for-finding';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

describe('readings for a finding', () => {
  it('lists only the readings tied to the finding, each with glyph, word and reason', async () => {
    const tied = makeMeasurement(1, {
      location: 'C30',
      quantity: 'leakage',
      expected: '32µ',
      rating: '350 V',
      reading: '2 mA',
      findingId: 12,
    });
    const { calls } = fakeReadingsApi([tied, volts(2, 'V5 pin 7', '250 V', '255 V')]);
    renderWithQueries(<MeasurementsForFinding restorationId={7} findingId={12} role="mentor" />);
    const list = await screen.findByRole('list', { name: 'Readings for this finding' });
    const items = within(list).getAllByRole('listitem');
    expect(items).toHaveLength(1);
    expect(within(items[0]!).getByText('Leakage current')).toBeInTheDocument();
    expect(within(items[0]!).getByText('out')).toBeInTheDocument();
    expect(within(items[0]!).getByText(/^Reads 2 mA against an expected maximum of/)).toBeInTheDocument();
    expect(calls[0]?.url).toBe('/api/restorations/7/measurements?findingId=12');
  });

  it('says so when none are tied to it', async () => {
    fakeReadingsApi([]);
    renderWithQueries(<MeasurementsForFinding restorationId={7} findingId={12} role="owner" />);
    expect(await screen.findByText('No readings tied to this finding.')).toBeInTheDocument();
  });
});
