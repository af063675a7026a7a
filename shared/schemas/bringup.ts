import { z } from 'zod';

/** What is looked at on the bench before anything is plugged in. */
export const intakeItems = [
  'valve-line-up',
  'mains-lead',
  'rubber-wiring',
  'mains-tap',
  'live-chassis',
  'missing-parts',
  'covers-knobs',
] as const;
export type IntakeItem = (typeof intakeItems)[number];

/** Each item in the trade's words (`label`, `hint`) and in words for the set's owner (`ownerLabel`). */
export const intakeItemWords: Record<IntakeItem, { label: string; hint: string; ownerLabel: string }> = {
  'valve-line-up': {
    label: 'Valve line-up and positions noted',
    hint: 'Types as fitted, socket by socket; substitutes noted.',
    ownerLabel: 'The valves and where each one sits were written down',
  },
  'mains-lead': {
    label: 'Mains lead and plug',
    hint: 'Cracked, perished or single-insulated leads are replaced.',
    ownerLabel: 'The mains lead and plug were inspected',
  },
  'rubber-wiring': {
    label: 'Rubber-insulated wiring',
    hint: 'Speaker, dial-lamp and internal leads: perished rubber crumbles.',
    ownerLabel: 'Old rubber-covered wiring was inspected',
  },
  'mains-tap': {
    label: 'Mains tap or voltage selector position',
    hint: 'As found, before anything is moved.',
    ownerLabel: 'The mains voltage setting was noted as found',
  },
  'live-chassis': {
    label: 'Live-chassis signs',
    hint: 'Series heaters, no mains transformer, a two-wire lead, wax-filled knob screws.',
    ownerLabel: 'Checked whether the metal chassis can carry mains voltage',
  },
  'missing-parts': {
    label: 'Missing or burnt parts',
    hint: 'Under the chassis: charred resistors, burst or leaking capacitors, bodges.',
    ownerLabel: 'Looked for missing, burnt or damaged parts',
  },
  'covers-knobs': {
    label: 'Back cover and knob insulation',
    hint: 'Back present and intact; knob grub screws insulated.',
    ownerLabel: 'The back cover and the knobs\u2019 insulation were checked',
  },
};

/** What must be true before the set first sees mains. */
export const prePowerItems = [
  'mains-tap',
  'filter-capacitors',
  'rectifier-transformer',
  'current-limiter',
  'isolation-transformer',
  'discharge-method',
] as const;
export type PrePowerItem = (typeof prePowerItems)[number];

export const prePowerItemWords: Record<PrePowerItem, { label: string; hint: string; ownerLabel: string }> = {
  'mains-tap': {
    label: 'Mains tap matched to the local mains',
    hint: 'Tap or selector set for the mains this set will run on.',
    ownerLabel: 'The mains voltage setting matches the local supply',
  },
  'filter-capacitors': {
    label: 'Filter and reservoir capacitors checked or replaced',
    hint: 'Checked for capacitance, ESR and leakage, or replaced.',
    ownerLabel: 'The main smoothing capacitors were checked or replaced',
  },
  'rectifier-transformer': {
    label: 'Rectifier and mains transformer checked, valves out where the design allows',
    hint: 'No dead short on the HT line; windings checked with the valves out.',
    ownerLabel: 'The rectifier and the mains transformer were checked',
  },
  'current-limiter': {
    label: 'Series lamp or variable transformer in place',
    hint: 'The first power goes through a current limit.',
    ownerLabel: 'The first switch-on was made through a current limiter',
  },
  'isolation-transformer': {
    label: 'Isolation transformer for a live-chassis set',
    hint: 'Not applicable when the set has a mains transformer and an earthed or isolated chassis.',
    ownerLabel: 'An isolating transformer was used for a set whose chassis can be live',
  },
  'discharge-method': {
    label: 'Discharge method at hand',
    hint: 'A resistor on insulated leads, and a meter to confirm the capacitors are flat.',
    ownerLabel: 'A safe way to discharge the capacitors was ready',
  },
};

export const prePowerStatuses = ['done', 'not-applicable', 'waived'] as const;
export type PrePowerStatus = (typeof prePowerStatuses)[number];
export const prePowerStatusLabels: Record<PrePowerStatus, string> = {
  done: 'Done',
  'not-applicable': 'Not applicable',
  waived: 'Waived',
};

const note = (max: number) => z.string().trim().max(max);
const id = z.number().int().positive().nullable();

export const intakeCheckInputSchema = z.object({
  item: z.enum(intakeItems),
  done: z.boolean(),
  note: note(500).default(''),
  findingId: id.default(null),
  photoId: id.default(null),
});
export type IntakeCheckInput = z.input<typeof intakeCheckInputSchema>;
export type IntakeCheck = z.output<typeof intakeCheckInputSchema>;

/** "Not applicable" and "waived" need a reason a later reader (or inspector) can follow. */
export const prePowerCheckInputSchema = z
  .object({ item: z.enum(prePowerItems), status: z.enum(prePowerStatuses).nullable(), reason: note(300).default('') })
  .refine((c) => c.status === null || c.status === 'done' || c.reason.length > 0, {
    path: ['reason'],
    message: 'Give the reason: not applicable and waived items must say why',
  });
export type PrePowerCheckInput = z.input<typeof prePowerCheckInputSchema>;
export type PrePowerCheck = z.output<typeof prePowerCheckInputSchema>;

export const supplies = ['series-lamp', 'variable-transformer', 'lamp-and-variable-transformer', 'full-mains'] as const;
export const supplyLabels: Record<(typeof supplies)[number], string> = {
  'series-lamp': 'Series lamp',
  'variable-transformer': 'Variable transformer',
  'lamp-and-variable-transformer': 'Series lamp and variable transformer',
  'full-mains': 'Full mains, no limiter',
};
export const lampBehaviours = ['no-lamp', 'flash-then-dim', 'steady-glow', 'bright-staying'] as const;
export const lampBehaviourLabels: Record<(typeof lampBehaviours)[number], string> = {
  'no-lamp': 'No lamp in circuit',
  'flash-then-dim': 'Brief flash, then dim',
  'steady-glow': 'Steady partial glow',
  'bright-staying': 'Bright and staying bright',
};
export const decisions = ['go-on', 'stop'] as const;
export const decisionLabels: Record<(typeof decisions)[number], string> = {
  'go-on': 'Go on',
  stop: 'Stop and find the fault',
};

/** Readings taken at a step: the powered quantities of a bring-up. */
export const stepQuantities = ['dc-voltage', 'ac-voltage', 'current'] as const;
export const stepReadingInputSchema = z.object({
  location: z.string().trim().min(1, 'Say where: HT, heater chain, mains input…').max(60),
  quantity: z.enum(stepQuantities),
  expected: note(40).default(''),
  tolerance: note(20).default(''),
  reading: z.string().trim().min(1, 'Enter the reading as the meter showed it').max(40),
});

const positive = z.number().positive().max(100_000).nullable().default(null);
export const bringupStepInputSchema = z.object({
  supply: z.enum(supplies),
  /** Series lamp rating (W and V), and the volts applied to the set (V): mains or the variable transformer's output. */
  lampWatts: positive,
  lampVolts: positive,
  appliedVolts: positive,
  lampBehaviour: z.enum(lampBehaviours),
  /** Smell, smoke, hum, heater glow, anything warm. */
  notes: note(1000).default(''),
  decision: z.enum(decisions),
  findingId: id.default(null),
  readings: z.array(stepReadingInputSchema).max(12).default([]),
});
export type BringupStepInput = z.input<typeof bringupStepInputSchema>;
export type BringupStepValues = z.output<typeof bringupStepInputSchema>;

const stepReadingSchema = z.object({
  measurementId: z.number().int(),
  location: z.string(),
  quantity: z.enum(stepQuantities),
  readingText: z.string(),
  expectedText: z.string(),
  verdict: z.enum(['within', 'marginal', 'out', 'unknown']),
  verdictReason: z.string(),
});

export const bringupSchema = z.object({
  intake: z.array(
    z.object({
      item: z.enum(intakeItems),
      done: z.boolean(),
      note: z.string(),
      findingId: z.number().int().nullable(),
      photoId: z.number().int().nullable(),
      checkedBy: z.string().nullable(),
      checkedAt: z.string().nullable(),
    }),
  ),
  prePower: z.object({
    items: z.array(
      z.object({
        item: z.enum(prePowerItems),
        status: z.enum(prePowerStatuses).nullable(),
        reason: z.string(),
        checkedBy: z.string().nullable(),
      }),
    ),
    signedOff: z.object({ by: z.string().nullable(), at: z.string() }).nullable(),
    /** What still stands between the checklist and a sign-off, in words. */
    missing: z.array(z.string()),
  }),
  steps: z.array(
    z.object({
      id: z.number().int(),
      number: z.number().int(),
      supply: z.enum(supplies),
      lampWatts: z.number().nullable(),
      lampVolts: z.number().nullable(),
      appliedVolts: z.number().nullable(),
      lampBehaviour: z.enum(lampBehaviours),
      notes: z.string(),
      decision: z.enum(decisions),
      findingId: z.number().int().nullable(),
      takenBy: z.string().nullable(),
      takenAt: z.string(),
      readings: z.array(stepReadingSchema),
    }),
  ),
});
export type Bringup = z.infer<typeof bringupSchema>;

/**
 * What still stands between a pre-power checklist and its sign-off, in words a person can act on:
 * every item needs a status, and "not applicable" or "waived" needs a reason.
 */
export function prePowerMissing(
  items: { item: PrePowerItem; status: PrePowerStatus | null; reason: string }[],
): string[] {
  const byItem = new Map(items.map((i) => [i.item, i]));
  return prePowerItems.flatMap((item) => {
    const c = byItem.get(item);
    const label = prePowerItemWords[item].label;
    if (!c?.status) return [`${label}: mark it done, not applicable or waived`];
    if (c.status !== 'done' && !c.reason.trim())
      return [`${label}: give the reason it is ${prePowerStatusLabels[c.status].toLowerCase()}`];
    return [];
  });
}
