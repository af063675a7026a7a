// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, fireEvent, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, notFound, ok } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';
import type { SharedHelp } from '../api/get-shared-help';
import { SharedHelpPage } from './shared-help-page';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const help: SharedHelp = {
  id: 4,
  restorationId: 9,
  symptom: 'Hum rises as the set warms up',
  createdAt: '2026-12-01T10:00:00.000Z',
  expiresAt: '2026-12-08T10:00:00.000Z',
  set: {
    make: 'Farrowby',
    model: 'Lark 3',
    year: 1952,
    chassis: null,
    mains: '240 V tap',
    equipmentKind: 'radio',
    liveChassis: false,
  },
  valves: [{ position: 'V1', type: 'ECH81' }],
  parts: [
    { id: 1, componentRef: 'C27', action: 'replaced', old: 'wax paper 22nF', new: 'film 22nF 630V', fittedAt: null },
  ],
  readings: [
    {
      id: 2,
      location: 'HT after smoothing',
      quantity: 'dc-voltage',
      expected: '250',
      tolerance: '10%',
      reading: '212',
      conditions: '',
      meter: '10 MΩ',
      chartMeter: '1k/V',
      verdict: 'out',
      verdictReason: 'below the tolerance',
      measuredAt: '2026-12-01T09:00:00.000Z',
    },
  ],
  photos: [
    {
      id: 3,
      caption: 'Underside',
      view: 'underside',
      phase: 'before',
      width: 600,
      height: 400,
      url: '/x.jpg',
      thumbUrl: '/x-t.jpg',
      pins: [
        {
          id: 5,
          number: 1,
          shape: 'pin',
          points: [{ x: 0.25, y: 0.75 }],
          title: 'Leaky C27',
          componentRef: 'C27',
          kind: 'leaking',
          severity: 'fault',
          status: 'observed',
          closeupUrl: '/c.webp',
        },
      ],
    },
  ],
  checklist: [
    {
      symptomId: 'hum',
      checks: [
        {
          symptomId: 'hum',
          causeId: 'poor-earth',
          result: 'confirmed',
          note: '',
          checkedBy: null,
          updatedAt: '2026-12-01T09:30:00.000Z',
          reading: {
            id: 8,
            location: 'V2 earth tag',
            reading: '4.7',
            expected: '0.5',
            verdict: 'out',
            verdictReason: 'above the tolerance',
          },
          finding: null,
        },
      ],
    },
  ],
  mismatches: [{ id: 6, ref: 'C27', line: 'C27: different value fitted; the diagram says 22nF; the chassis has 47nF' }],
  replies: [],
};
const show = () => renderWithQueries(<SharedHelpPage token="abc" />, { router: false });

describe('the shared help page', () => {
  it('when the link works, then it shows the chart with its verdict and meter, and the pin at its spot', async () => {
    fakeApi(() => ok(help));
    show();
    expect(await screen.findByRole('heading', { name: 'Farrowby Lark 3' })).toBeInTheDocument();
    expect(screen.getByRole('row', { name: /HT after smoothing/ })).toHaveTextContent(
      /250.*212.*out.*10 MΩ.*chart taken with 1k\/V/,
    );
    const pin = screen.getByTestId('help-pin');
    expect([pin.getAttribute('data-x'), pin.getAttribute('data-y')]).toEqual(['0.25', '0.75']);
    expect(screen.getByRole('img', { name: 'Close-up of spot 1: Leaky C27' })).toHaveAttribute('src', '/c.webp');
    // The checklist: every cause of the symptom in order, the checked one with its result and reading.
    const checklist = screen.getByRole('heading', { name: 'Checklist: Loud hum' }).closest('div')!.parentElement!;
    expect(checklist).toHaveTextContent(
      /1\. Reservoir .*not checked yet.*2\. Poor earth .*Confirmed.*V2 earth tag read 4\.7/,
    );
    expect(screen.getByRole('heading', { name: 'Where the chassis differs from the diagram' })).toBeInTheDocument();
    expect(screen.getByText('C27: different value fitted; the diagram says 22nF; the chassis has 47nF').tagName).toBe(
      'LI',
    );
    expect(document.querySelector('meta[name="robots"]')).toHaveAttribute('content', expect.stringMatching(/noindex/));
  });

  it('when the link is gone, then the reader is told it no longer works, not that something broke', async () => {
    fakeApi(() => notFound());
    show();
    expect(await screen.findByText('This link does not work')).toBeInTheDocument();
  });

  it('when a reply is sent, then it is posted as { name, body } and the reader is told it waits for the technician', async () => {
    const api = fakeApi((call) => (call.method === 'POST' ? { status: 202, body: { id: 1, held: true } } : ok(help)));
    show();
    fireEvent.change(await screen.findByLabelText('Your name'), { target: { value: 'Club member' } });
    fireEvent.change(screen.getByLabelText(/Your reply/), { target: { value: 'Reform the can first.' } });
    fireEvent.click(screen.getByRole('button', { name: 'Send reply' }));
    expect(await screen.findByText(/will add it to the thread/)).toBeInTheDocument();
    expect(api.calls.find((c) => c.method === 'POST')).toEqual({
      method: 'POST',
      path: '/shared/help/abc/replies',
      body: { name: 'Club member', body: 'Reform the can first.' },
    });
  });
});
