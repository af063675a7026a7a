// @vitest-environment happy-dom
import '@testing-library/jest-dom/vitest';
import { cleanup, screen } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { Role } from '../../../../shared/permissions';
import type { SafetyStatus, SafetyTest, SoakLog } from '../../../../shared/schemas/safety';
import { SafetyTab } from './safety-tab';
import { fakeApi, ok } from '../../../testing/fake-api';
import { renderWithQueries } from '../../../testing/render';

afterEach(() => {
  cleanup();
  vi.unstubAllGlobals();
});

const failed: SafetyTest = {
  id: 3,
  restorationId: 7,
  equipmentClass: 'class-1',
  specification: 'original',
  modifications: '',
  notes: '',
  verdict: 'fail',
  testedBy: 'Ilse Bench',
  testedAt: '2026-12-01T10:00:00.000Z',
  lines: [
    {
      key: 'earth',
      label: 'Protective earth continuity, chassis to plug earth pin',
      value: 0.6,
      unit: 'Ω',
      limit: 0.15,
      sense: 'max',
      limitText: '≤ 0.15 Ω (0.1 Ω + lead 0.05 Ω)',
      source: 'IET Code of Practice for In-service Inspection and Testing of Electrical Equipment',
      verdict: 'fail',
    },
  ],
};
const soak: SoakLog = {
  sessions: [],
  totalHours: 0,
  running: {
    id: 1,
    startedAt: new Date(Date.now() - 65_000).toISOString(),
    endedAt: null,
    hours: null,
    ambientC: null,
    chassisC: null,
    mainsCurrentAmps: null,
    faults: '',
    actionTaken: '',
    findingId: null,
    startedBy: 'Ilse Bench',
  },
};

function serve(status: SafetyStatus) {
  fakeApi(({ path }) => (path.endsWith('/soak-sessions') ? ok(soak) : ok(status)));
}
const show = (role: Role) =>
  renderWithQueries(<SafetyTab restorationId={7} role={role} liveChassis={false} />, { router: false });

describe('safety tab', () => {
  it('when the latest test failed, then the technician sees the failing line with its limit and source, the gate, and the override form', async () => {
    serve({ tests: [failed], latest: failed, override: null, returnedAllowed: false });
    show('technician');
    expect(await screen.findByText('Not passed')).toBeInTheDocument();
    expect(screen.getByRole('row', { name: /Protective earth continuity/ })).toHaveTextContent(
      /600 mΩ.*≤ 0.15 Ω.*Fail.*IET Code of Practice/,
    );
    expect(screen.getByRole('status')).toHaveTextContent('cannot be marked Returned');
    expect(screen.getByRole('form', { name: 'Return without a passing safety test' })).toBeInTheDocument();
    expect(screen.getByText('Safety test: HT can kill.')).toBeInTheDocument();
    expect(await screen.findByRole('timer')).toHaveTextContent(/0:01:0\d/); // the running soak, timed from the server's start
  });

  it('when an owner or a mentor opens it, then they read the result but record nothing', async () => {
    for (const role of ['owner', 'mentor'] as const) {
      serve({
        tests: [failed],
        latest: failed,
        override: { id: 1, reason: 'Display piece only', by: 'Ilse Bench', at: '2026-12-01T11:00:00.000Z' },
        returnedAllowed: true,
      });
      show(role);
      expect(await screen.findByText('Not passed')).toBeInTheDocument();
      expect(screen.getByText(/Display piece only/)).toBeInTheDocument();
      expect(screen.queryByRole('form', { name: 'Record a final safety test' })).not.toBeInTheDocument();
      expect(screen.queryByRole('form', { name: 'Return without a passing safety test' })).not.toBeInTheDocument();
      expect(screen.queryByRole('button', { name: 'Start a soak run' })).not.toBeInTheDocument();
      expect(screen.queryByRole('form', { name: 'Stop the soak run' })).not.toBeInTheDocument();
      cleanup();
    }
  });
});
