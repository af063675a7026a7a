import {
  bringupStepInputSchema,
  type BringupStepInput,
  type decisions,
  type lampBehaviours,
  type stepQuantities,
  type supplies,
} from '../../../../shared/schemas/bringup';

/** A power-up step as it is being typed: every box is text until it is sent. */
export interface StepDraft {
  supply: (typeof supplies)[number];
  lampWatts: string;
  lampVolts: string;
  appliedVolts: string;
  lampBehaviour: (typeof lampBehaviours)[number];
  notes: string;
  decision: (typeof decisions)[number] | '';
  /** The finding this step turned up or was about ('' for none). */
  findingId: string;
  readings: {
    location: string;
    quantity: (typeof stepQuantities)[number];
    expected: string;
    tolerance: string;
    reading: string;
  }[];
}

/** The three readings a bring-up step usually takes; rows left without a reading are not sent. */
export const emptyDraft = (previous?: Pick<StepDraft, 'lampWatts' | 'lampVolts' | 'appliedVolts'>): StepDraft => ({
  supply: 'series-lamp',
  lampWatts: previous?.lampWatts ?? '',
  lampVolts: previous?.lampVolts ?? '',
  appliedVolts: previous?.appliedVolts ?? '',
  lampBehaviour: 'flash-then-dim',
  notes: '',
  decision: '',
  findingId: '',
  readings: [
    { location: 'HT', quantity: 'dc-voltage', expected: '', tolerance: '', reading: '' },
    { location: 'Heater chain', quantity: 'ac-voltage', expected: '', tolerance: '', reading: '' },
    { location: 'Mains input', quantity: 'current', expected: '', tolerance: '', reading: '' },
  ],
});

export const usesLamp = (supply: StepDraft['supply']) =>
  supply === 'series-lamp' || supply === 'lamp-and-variable-transformer';

const number = (text: string) => (text.trim() === '' ? null : Number(text.trim().replace(',', '.')));

/** Turns the draft into the request, or the first problem per box in words. */
export function readDraft(
  d: StepDraft,
): { ok: true; input: BringupStepInput } | { ok: false; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const lamp = usesLamp(d.supply);
  const values = {
    lampWatts: lamp ? number(d.lampWatts) : null,
    lampVolts: lamp ? number(d.lampVolts) : null,
    appliedVolts: number(d.appliedVolts),
  };
  for (const [k, v] of Object.entries(values)) if (v !== null && !(v > 0)) errors[k] = 'Enter a number above zero';
  if (lamp && values.lampWatts === null) errors.lampWatts = 'Give the lamp’s watts';
  if (lamp && values.lampVolts === null) errors.lampVolts = 'Give the lamp’s rated volts';
  if (!d.decision) errors.decision = 'Choose: go on, or stop and find the fault';
  const input = {
    supply: d.supply,
    ...values,
    lampBehaviour: lamp ? d.lampBehaviour : 'no-lamp',
    notes: d.notes,
    decision: d.decision || 'stop',
    findingId: d.findingId ? Number(d.findingId) : null,
    readings: d.readings.filter((r) => r.reading.trim() !== ''),
  } satisfies BringupStepInput;
  const parsed = bringupStepInputSchema.safeParse(input);
  if (!parsed.success) for (const issue of parsed.error.issues) errors[issue.path.join('.')] ??= issue.message;
  return Object.keys(errors).length ? { ok: false, errors } : { ok: true, input };
}
