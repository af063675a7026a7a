// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, fireEvent, screen, within } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { fakeApi, ok } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';
import { SymptomChecklist } from './symptom-checklist';

// The causes and their order are the checklist data's (shared/bench/symptoms, from TRADE.md §5).
afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const show = (canEdit: boolean) =>
  renderWithQueries(<SymptomChecklist restorationId={9} canEdit={canEdit} />, { router: false });

describe('the symptom checklist', () => {
  it('when a symptom is chosen, then its causes are listed in order with their tests, and a powered test carries the cautions', async () => {
    fakeApi(() => ok([]));
    show(false);
    fireEvent.change(await screen.findByLabelText('Symptom'), { target: { value: 'hum' } });
    const causes = await screen.findAllByRole('listitem');
    expect(causes.map((c) => c.getAttribute('aria-label'))).toEqual([
      'Reservoir or smoothing electrolytics lost their capacitance',
      'Poor earth at a rusted valve-socket rivet or tag',
      'Heater-to-cathode leakage in an audio valve',
    ]);
    expect(causes[0]).toHaveTextContent(/Measured with the set switched on.*local codes and licensed practice/);
    expect(causes[1]).not.toHaveTextContent(/Measured with the set switched on/);
    expect(screen.queryByRole('button', { name: 'Save result' })).toBeNull();
  });

  it('when the technician confirms a cause with a reading, then it is sent as the result, the reading and no finding', async () => {
    const saved = {
      symptomId: 'hum',
      causeId: 'poor-earth',
      result: 'confirmed',
      note: '',
      reading: null,
      finding: null,
      checkedBy: 'A technician',
      updatedAt: '2026-12-01T10:00:00Z',
    };
    const api = fakeApi((call) => (call.method === 'PUT' ? ok(saved) : ok([])));
    show(true);
    fireEvent.change(await screen.findByLabelText('Symptom'), { target: { value: 'hum' } });
    const earth = await screen.findByRole('listitem', { name: 'Poor earth at a rusted valve-socket rivet or tag' });
    fireEvent.click(within(earth).getByLabelText('Confirmed'));
    fireEvent.change(within(earth).getByLabelText('Reading'), { target: { value: '4.7' } });
    fireEvent.change(within(earth).getByLabelText('Expected (chart)'), { target: { value: '0.5' } });
    fireEvent.click(within(earth).getByRole('button', { name: 'Save result' }));
    await vi.waitFor(() => expect(api.calls.some((c) => c.method === 'PUT')).toBe(true));
    expect(api.calls.find((c) => c.method === 'PUT')).toEqual({
      method: 'PUT',
      path: '/restorations/9/symptom-checks/hum/poor-earth',
      body: {
        result: 'confirmed',
        note: '',
        reading: {
          location: 'Earth tag to chassis',
          quantity: 'resistance',
          expected: '0.5',
          reading: '4.7',
          powerOn: false,
        },
      },
    });
  });

  it('when results are already recorded, then the checklist opens on their symptom and the choice says how many were checked', async () => {
    const check = {
      symptomId: 'hum',
      causeId: 'poor-earth',
      result: 'ruled-out',
      note: 'Tags tight and clean.',
      reading: null,
      finding: null,
      checkedBy: 'A technician',
      updatedAt: '2026-12-01T10:00:00Z',
    };
    fakeApi(() => ok([check]));
    show(false);
    const earth = await screen.findByRole('listitem', { name: 'Poor earth at a rusted valve-socket rivet or tag' });
    expect(within(earth).getByRole('status')).toHaveTextContent('Ruled out');
    expect(screen.getByLabelText('Symptom')).toHaveDisplayValue('Loud hum (1 checked)');
  });
});
