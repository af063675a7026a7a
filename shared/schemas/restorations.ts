import { z } from 'zod';
import { roles } from '../permissions';
import { idSchema } from './ids';

export const stages = ['intake', 'assessment', 'repair', 'testing', 'returned', 'on-hold'] as const;
export const stageSchema = z.enum(stages);
export type Stage = z.infer<typeof stageSchema>;

export const stageLabels: Record<Stage, string> = {
  intake: 'Intake',
  assessment: 'Assessment',
  repair: 'Repair',
  testing: 'Testing',
  returned: 'Returned',
  'on-hold': 'On hold',
};

export const equipmentKinds = [
  'radio',
  'radiogram',
  'amplifier',
  'tape-recorder',
  'television',
  'test-gear',
  'other',
] as const;
export const equipmentKindLabels: Record<(typeof equipmentKinds)[number], string> = {
  radio: 'Radio',
  radiogram: 'Radiogram',
  amplifier: 'Amplifier',
  'tape-recorder': 'Tape recorder',
  television: 'Television',
  'test-gear': 'Test gear',
  other: 'Other',
};

/** Scope agreed with the owner, from the fewest parts that make it play to a full restoration. */
export const workLevels = ['make-it-play', 'repair', 'refurbish', 'full-restoration'] as const;
export const workLevelLabels: Record<(typeof workLevels)[number], string> = {
  'make-it-play': 'Make it play',
  repair: 'Repair',
  refurbish: 'Refurbish',
  'full-restoration': 'Full restoration',
};

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max, `must be at most ${max} characters`)
    .transform((v) => (v === '' ? null : v))
    .nullable()
    .optional();

const thisYear = new Date().getFullYear();

const restorationFields = {
  make: z.string().trim().min(1, 'Enter the maker, as printed on the set').max(120),
  model: z.string().trim().min(1, 'Enter the model name or number').max(120),
  year: z
    .preprocess(
      (v) => (v === '' || v === undefined ? null : v),
      z.coerce
        .number('Enter a year, e.g. 1954')
        .int('Enter a whole year, e.g. 1954')
        .min(1900, 'Enter a year from 1900 on')
        .max(thisYear, `Enter a year up to ${thisYear}`)
        .nullable(),
    )
    .optional(),
  serial: optionalText(80),
  equipmentKind: z.enum(equipmentKinds),
  mainsSetting: optionalText(120),
  liveChassis: z.boolean(),
  symptoms: optionalText(4000),
  conditionNotes: optionalText(4000),
  workLevel: z.enum(workLevels),
  hiddenPartsOriginal: z.boolean(),
  story: optionalText(8000),
  careNotes: optionalText(4000),
  receivedOn: z
    .preprocess((v) => (v === '' ? null : v), z.iso.date('Enter a date as YYYY-MM-DD').nullable())
    .optional(),
  stage: stageSchema,
  /** Who owns the set, as recorded at intake (they need no account). */
  ownerName: optionalText(120),
  ownerEmail: z
    .preprocess(
      (v) => (typeof v === 'string' && v.trim() === '' ? null : typeof v === 'string' ? v.trim() : v),
      z.email('Enter an e-mail address, e.g. name@example.com').max(254).nullable(),
    )
    .optional(),
};

/** Body of POST /api/restorations: make and model are required, the rest can follow at intake. */
export const restorationInputSchema = z
  .object({
    ...restorationFields,
    equipmentKind: restorationFields.equipmentKind.default('radio'),
    liveChassis: restorationFields.liveChassis.default(false),
    workLevel: restorationFields.workLevel.default('repair'),
    hiddenPartsOriginal: restorationFields.hiddenPartsOriginal.default(false),
    stage: restorationFields.stage.default('intake'),
    /** Invite the owner (by `ownerEmail`) to follow the set, in the same step as the intake. */
    inviteOwner: z.boolean().default(false),
  })
  .refine((v) => !v.inviteOwner || Boolean(v.ownerEmail), {
    path: ['ownerEmail'],
    message: "Enter the owner's e-mail to invite them",
  });
export type RestorationInput = z.input<typeof restorationInputSchema>;

/** Only what is sent changes: no defaults here, or a stage change would reset the other fields. */
export const restorationPatchSchema = z.object(restorationFields).partial();

export const restorationSchema = z.object({
  id: z.number().int(),
  make: z.string(),
  model: z.string(),
  year: z.number().int().nullable(),
  serial: z.string().nullable(),
  equipmentKind: z.enum(equipmentKinds),
  mainsSetting: z.string().nullable(),
  liveChassis: z.boolean(),
  symptoms: z.string().nullable(),
  conditionNotes: z.string().nullable(),
  workLevel: z.enum(workLevels),
  hiddenPartsOriginal: z.boolean(),
  story: z.string().nullable(),
  careNotes: z.string().nullable(),
  receivedOn: z.string().nullable(),
  stage: stageSchema,
  ownerName: z.string().nullable(),
  ownerEmail: z.string().nullable(),
  /** The caller's role on this restoration. */
  role: z.enum(roles),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Restoration = z.infer<typeof restorationSchema>;

export const restorationListQuerySchema = z.object({
  q: z.string().trim().max(120).optional(),
  stage: stageSchema.optional(),
});

export const idParamsSchema = z.object({ id: idSchema });
