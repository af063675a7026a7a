import { z } from 'zod';
import { equipmentClasses } from '../bench/safety-test';

/**
 * The final safety test, soak sessions and the hand-back send. Readings are typed as a person writes them
 * ("0.08", "50M", "4.7n", "0.2m") and judged on the server by the bench library.
 */
const reading = (max = 40) => z.string().trim().max(max).default('');
const note = (max: number) => z.string().trim().max(max).default('');

export const specifications = ['original', 'modified'] as const;
export const specificationLabels: Record<(typeof specifications)[number], string> = {
  original: 'To original specification',
  modified: 'Modified from original specification',
};

/** Body of POST /api/restorations/:id/safety-tests. */
export const safetyTestInputSchema = z
  .object({
    equipmentClass: z.enum(equipmentClasses),
    /** Chassis to plug earth pin, Ω. */
    earth: reading(),
    /** The lead's own earth-core resistance, Ω ('' or 0 when the meter nulls it). */
    lead: reading(),
    /** Live and neutral joined, to exposed metal, Ω (e.g. "50M"). */
    insulation: reading(),
    insulationVolts: reading().default('500'),
    /** Touch or leakage current where measured, A (e.g. "0.1m"). */
    touchCurrent: reading(),
    /** Mains-to-chassis (Y) capacitor, F (e.g. "2.2n"), when there is one. */
    yCapacitor: reading(),
    mainsVolts: reading().default('230'),
    mainsHertz: reading().default('50'),
    fuseFitted: reading(),
    fuseRecommended: reading(),
    leadAndStrainRelief: z.boolean(),
    coversRefitted: z.boolean(),
    safetyClassCapacitors: z.boolean(),
    specification: z.enum(specifications),
    modifications: note(2000),
    notes: note(4000),
  })
  .refine((v) => v.specification === 'original' || v.modifications.length > 0, {
    path: ['modifications'],
    message: 'Say what was modified: a later inspector needs to know.',
  });
export type SafetyTestInput = z.input<typeof safetyTestInputSchema>;

/** A whole test's outcome (also the `safety_verdict` database enum). */
export const safetyVerdicts = ['pass', 'fail'] as const;

export const safetyLineSchema = z.object({
  key: z.enum(['earth', 'insulation', 'touch', 'y-capacitor', 'fuse', 'lead', 'covers', 'capacitor-class']),
  label: z.string(),
  value: z.number().nullable(),
  unit: z.enum(['Ω', 'A', '']),
  limit: z.number().nullable(),
  sense: z.enum(['max', 'min', 'check']),
  limitText: z.string(),
  source: z.string(),
  verdict: z.enum(['pass', 'fail', 'not-applicable', 'not-measured']),
});
export type SafetyLineView = z.infer<typeof safetyLineSchema>;

export const safetyTestSchema = z.object({
  id: z.number().int(),
  restorationId: z.number().int(),
  equipmentClass: z.enum(equipmentClasses),
  specification: z.enum(specifications),
  modifications: z.string(),
  notes: z.string(),
  lines: z.array(safetyLineSchema),
  verdict: z.enum(safetyVerdicts),
  testedBy: z.string().nullable(),
  testedAt: z.string(),
});
export type SafetyTest = z.infer<typeof safetyTestSchema>;

/** Body of POST /api/restorations/:id/safety-override: returning the set without a passing test. */
export const safetyOverrideInputSchema = z.object({
  reason: z.string().trim().min(10, 'Give the reason in a sentence (at least 10 characters).').max(2000),
});
export const safetyOverrideSchema = z.object({
  id: z.number().int(),
  reason: z.string(),
  by: z.string().nullable(),
  at: z.string(),
});
export type SafetyOverride = z.infer<typeof safetyOverrideSchema>;

/** GET /api/restorations/:id/safety-tests: every test (newest first) and whether the set may go to Returned. */
export const safetyStatusSchema = z.object({
  tests: z.array(safetyTestSchema),
  latest: safetyTestSchema.nullable(),
  override: safetyOverrideSchema.nullable(),
  returnedAllowed: z.boolean(),
});
export type SafetyStatus = z.infer<typeof safetyStatusSchema>;

const celsius = z.preprocess(
  (v) => (v === '' || v === undefined ? null : v),
  z.coerce.number().min(-40).max(200).nullable(),
);
/** Body of PATCH /api/restorations/:id/soak-sessions/running: stops the running session with what was seen. */
export const soakStopSchema = z.object({
  ambientC: celsius.optional(),
  chassisC: celsius.optional(),
  /** Mains current drawn, A (e.g. "0.25" or "250m"). */
  mainsCurrent: reading(),
  /** Faults seen; any text here opens a finding. */
  faults: note(2000),
  actionTaken: note(2000),
  /** The photo the fault's finding is pinned on; the newest photo when not given. */
  photoId: z.number().int().positive().optional(),
});
export type SoakStop = z.input<typeof soakStopSchema>;

export const soakSessionSchema = z.object({
  id: z.number().int(),
  startedAt: z.string(),
  endedAt: z.string().nullable(),
  /** Length in hours once stopped. */
  hours: z.number().nullable(),
  ambientC: z.number().nullable(),
  chassisC: z.number().nullable(),
  mainsCurrentAmps: z.number().nullable(),
  faults: z.string(),
  actionTaken: z.string(),
  findingId: z.number().int().nullable(),
  startedBy: z.string().nullable(),
});
export type SoakSession = z.infer<typeof soakSessionSchema>;
export const soakLogSchema = z.object({
  sessions: z.array(soakSessionSchema),
  totalHours: z.number(),
  running: soakSessionSchema.nullable(),
});
export type SoakLog = z.infer<typeof soakLogSchema>;

export const handBackWarningSchema = z.object({
  code: z.enum([
    'stage-before-testing',
    'open-questions',
    'no-passing-safety-test',
    'safety-override',
    'no-soak',
    'no-owner',
  ]),
  message: z.string(),
});
export type HandBackWarning = z.infer<typeof handBackWarningSchema>;

export const reportSendSchema = z.object({
  id: z.number().int(),
  sentAt: z.string(),
  sentBy: z.string().nullable(),
  recipients: z.array(z.string()),
  attachmentName: z.string(),
  pageCount: z.number().int(),
  /** SHA-256 of the PDF sent, so the copy the owner holds can be matched later. */
  sha256: z.string(),
  warnings: z.array(z.string()),
});
export type ReportSend = z.infer<typeof reportSendSchema>;

/** Answer of POST /api/restorations/:id/report/send: who it went to, the record of the send and its warnings. */
export const reportSentSchema = z.object({
  sentTo: z.array(z.string()),
  sendId: z.number().int(),
  warnings: z.array(z.string()),
});
export type ReportSent = z.infer<typeof reportSentSchema>;

/** GET /api/restorations/:id/report/preview: the e-mail the owner will receive, and why it may be premature. */
export const reportPreviewSchema = z.object({
  recipients: z.array(z.object({ name: z.string(), email: z.string() })),
  subject: z.string(),
  body: z.string(),
  attachmentName: z.string(),
  pageCount: z.number().int(),
  warnings: z.array(handBackWarningSchema),
  sends: z.array(reportSendSchema),
});
export type ReportPreview = z.infer<typeof reportPreviewSchema>;
