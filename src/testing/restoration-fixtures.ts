import type { Restoration } from '../../shared/schemas/restorations';

/** A set on the bench as the API answers it, from the invented workshop; tests override what they care about. */
export function makeRestoration(id: number, overrides: Partial<Restoration> = {}): Restoration {
  return {
    id,
    make: 'Kestrel Wireless Co.',
    model: 'Merlin',
    year: 1952,
    serial: null,
    equipmentKind: 'radio',
    mainsSetting: null,
    liveChassis: false,
    symptoms: null,
    conditionNotes: null,
    workLevel: 'repair',
    hiddenPartsOriginal: false,
    story: null,
    careNotes: null,
    receivedOn: null,
    stage: 'repair',
    ownerName: null,
    ownerEmail: null,
    role: 'technician',
    createdAt: '2026-11-01T09:00:00Z',
    updatedAt: '2026-11-01T09:00:00Z',
    ...overrides,
  };
}
