import { z } from 'zod';
import { symptomIds } from '../bench/symptoms';
import { pointSchema, shapes } from './findings';
import { bodyIdSchema, idSchema } from './ids';
import { verdicts } from './measurements';
import { symptomCheckSchema } from './symptom-checks';

/** A help request: the symptom in the technician's words; everything else is pre-filled from the restoration. */
export const helpRequestInputSchema = z.object({ symptom: z.string().trim().min(1, 'describe the symptom').max(4000) });

/** What goes with the request; the technician removes what is not relevant. No defaults (decision 15). */
export const helpRequestPatchSchema = z.object({
  symptom: z.string().trim().min(1, 'describe the symptom').max(4000).optional(),
  includeSet: z.boolean().optional(),
  includeValves: z.boolean().optional(),
  partIds: z.array(bodyIdSchema).max(500).optional(),
  measurementIds: z.array(bodyIdSchema).max(500).optional(),
  photoIds: z.array(bodyIdSchema).max(100).optional(),
  /** Symptoms of the checklist whose causes and results go with the request. */
  symptomIds: z
    .array(z.enum(symptomIds as [string, ...string[]]))
    .max(50)
    .optional(),
});
export type HelpRequestPatch = z.infer<typeof helpRequestPatchSchema>;

/** Days a new link stays valid: 7 unless chosen, at most 30. */
export const helpLinkInputSchema = z.object({ days: z.number().int().min(1).max(30).optional() });
export const HELP_LINK_DAYS = 7;

/** A reply left through a link by someone without an account. */
export const helpReplyInputSchema = z.object({
  name: z.string().trim().min(1, 'give a name to sign the reply').max(80),
  body: z.string().trim().min(1, 'write a reply').max(4000),
});
export type HelpReplyInput = z.infer<typeof helpReplyInputSchema>;

export const helpRequestParamsSchema = z.object({ helpRequestId: idSchema });
export const helpReplyParamsSchema = z.object({ replyId: idSchema });
/** A link's token: 32 random bytes in base64url are 43 characters; anything else is simply not found. */
export const helpTokenParamsSchema = z.object({ token: z.string().min(1).max(200) });

export const helpSetSchema = z.object({
  make: z.string(),
  model: z.string(),
  year: z.number().nullable(),
  /** The chassis serial: workshop notes, never on a link. */
  chassis: z.string().nullable(),
  mains: z.string().nullable(),
  equipmentKind: z.string(),
  liveChassis: z.boolean(),
});
export type HelpSet = z.infer<typeof helpSetSchema>;

export const helpValveSchema = z.object({ position: z.string(), type: z.string() });
export type HelpValve = z.infer<typeof helpValveSchema>;

export const helpPartSchema = z.object({
  id: z.number(),
  componentRef: z.string(),
  action: z.string(),
  old: z.string(),
  new: z.string(),
  fittedAt: z.string().nullable(),
});
export type HelpPart = z.infer<typeof helpPartSchema>;

export const helpReadingSchema = z.object({
  id: z.number(),
  location: z.string(),
  quantity: z.string(),
  expected: z.string(),
  tolerance: z.string(),
  reading: z.string(),
  conditions: z.string(),
  meter: z.string(),
  chartMeter: z.string(),
  verdict: z.enum(verdicts),
  verdictReason: z.string(),
  measuredAt: z.string(),
});
export type HelpReading = z.infer<typeof helpReadingSchema>;

export const helpPinSchema = z.object({
  id: z.number(),
  number: z.number(),
  shape: z.enum(shapes),
  points: z.array(pointSchema),
  title: z.string(),
  componentRef: z.string(),
  kind: z.string(),
  severity: z.string(),
  status: z.string(),
  /** A signed URL of the close-up of the marked spot; null when it could not be cut. */
  closeupUrl: z.string().nullable(),
});
export type HelpPin = z.infer<typeof helpPinSchema>;

/** A symptom of the checklist with the results of its causes (causes, tests and sources come from shared/bench/symptoms). */
export const helpChecklistSchema = z.object({ symptomId: z.string(), checks: z.array(symptomCheckSchema) });
export type HelpChecklist = z.infer<typeof helpChecklistSchema>;

export const helpPhotoSchema = z.object({
  id: z.number(),
  caption: z.string(),
  view: z.string(),
  phase: z.string(),
  width: z.number(),
  height: z.number(),
  url: z.string(),
  thumbUrl: z.string(),
  pins: z.array(helpPinSchema),
});
export type HelpPhoto = z.infer<typeof helpPhotoSchema>;

/** A part on the chassis that differs from the diagram, for a reference the request names. */
export const helpMismatchSchema = z.object({ id: z.number(), ref: z.string(), line: z.string() });
export type HelpMismatch = z.infer<typeof helpMismatchSchema>;

export const helpReplySchema = z.object({
  id: z.number(),
  name: z.string(),
  body: z.string(),
  createdAt: z.string(),
  approved: z.boolean(),
});
export type HelpReply = z.infer<typeof helpReplySchema>;

/** The request as one reader may see it: the link's reader is judged like an owner (nothing unshared). */
export const helpContentSchema = z.object({
  id: z.number(),
  restorationId: z.number(),
  symptom: z.string(),
  createdAt: z.string(),
  set: helpSetSchema.nullable(),
  valves: z.array(helpValveSchema).nullable(),
  parts: z.array(helpPartSchema),
  readings: z.array(helpReadingSchema),
  photos: z.array(helpPhotoSchema),
  checklist: z.array(helpChecklistSchema),
  /** Mismatch notes on the references the chosen parts, readings and pins name. */
  mismatches: z.array(helpMismatchSchema),
  replies: z.array(helpReplySchema),
});
export type HelpContent = z.infer<typeof helpContentSchema>;

/** What a link's reader gets: the content and when the link ends. */
export const sharedHelpSchema = helpContentSchema.extend({ expiresAt: z.string() });
export type SharedHelp = z.infer<typeof sharedHelpSchema>;

/** The technician's and mentors' view adds the choices and the links (never their tokens). */
export const helpRequestSchema = helpContentSchema.extend({
  includeSet: z.boolean(),
  includeValves: z.boolean(),
  partIds: z.array(z.number()),
  measurementIds: z.array(z.number()),
  photoIds: z.array(z.number()),
  symptomIds: z.array(z.string()),
  links: z.array(
    z.object({ id: z.number(), expiresAt: z.string(), revokedAt: z.string().nullable(), createdAt: z.string() }),
  ),
});
export type HelpRequest = z.infer<typeof helpRequestSchema>;

export const helpRequestSummarySchema = z.object({
  id: z.number(),
  symptom: z.string(),
  createdAt: z.string(),
  pendingReplies: z.number(),
});
export type HelpRequestSummary = z.infer<typeof helpRequestSummarySchema>;

/** Answer of a reply left through a link (202): it is held until the technician approves it. */
export const heldReplySchema = z.object({ id: z.number(), held: z.literal(true) });

export const helpLinkCreatedSchema = z.object({ url: z.string(), token: z.string(), expiresAt: z.string() });
export type HelpLinkCreated = z.infer<typeof helpLinkCreatedSchema>;

/** A request on the bench of a technician or mentor of its restoration. */
export const benchHelpRequestSchema = z.object({
  id: z.number(),
  restorationId: z.number(),
  set: z.string(),
  symptom: z.string(),
  createdAt: z.string(),
});
export type BenchHelpRequest = z.infer<typeof benchHelpRequestSchema>;
