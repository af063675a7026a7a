import { z } from 'zod';
import type { Shape, NormalisedPoint } from './findings';
import { symptomIds } from '../bench/symptoms';
import { bodyIdSchema, idSchema } from './ids';
import type { SymptomCheck } from './symptom-checks';

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

export interface HelpSet {
  make: string;
  model: string;
  year: number | null;
  chassis: string | null;
  mains: string | null;
  equipmentKind: string;
  liveChassis: boolean;
}
export interface HelpValve {
  position: string;
  type: string;
}
export interface HelpPart {
  id: number;
  componentRef: string;
  action: string;
  old: string;
  new: string;
  fittedAt: string | null;
}
export interface HelpReading {
  id: number;
  location: string;
  quantity: string;
  expected: string;
  tolerance: string;
  reading: string;
  conditions: string;
  meter: string;
  chartMeter: string;
  verdict: 'within' | 'marginal' | 'out' | 'unknown';
  verdictReason: string;
  measuredAt: string;
}
export interface HelpPin {
  id: number;
  number: number;
  shape: Shape;
  points: NormalisedPoint[];
  title: string;
  componentRef: string;
  kind: string;
  severity: string;
  status: string;
  /** A signed URL of the close-up of the marked spot; null when it could not be cut. */
  closeupUrl: string | null;
}
/** A symptom of the checklist with the results of its causes (causes, tests and sources come from shared/bench/symptoms). */
export interface HelpChecklist {
  symptomId: string;
  checks: SymptomCheck[];
}
export interface HelpPhoto {
  id: number;
  caption: string;
  view: string;
  phase: string;
  width: number;
  height: number;
  url: string;
  thumbUrl: string;
  pins: HelpPin[];
}
/** A part on the chassis that differs from the diagram, for a reference the request names. */
export interface HelpMismatch {
  id: number;
  ref: string;
  line: string;
}
export interface HelpReply {
  id: number;
  name: string;
  body: string;
  createdAt: string;
  approved: boolean;
}

/** The request as one reader may see it: the link's reader is judged like an owner (nothing unshared). */
export interface HelpContent {
  id: number;
  restorationId: number;
  symptom: string;
  createdAt: string;
  set: HelpSet | null;
  valves: HelpValve[] | null;
  parts: HelpPart[];
  readings: HelpReading[];
  photos: HelpPhoto[];
  checklist: HelpChecklist[];
  /** Mismatch notes on the references the chosen parts, readings and pins name. */
  mismatches: HelpMismatch[];
  replies: HelpReply[];
}

/** The technician's and mentors' view adds the choices and the links (never their tokens). */
export interface HelpRequest extends HelpContent {
  includeSet: boolean;
  includeValves: boolean;
  partIds: number[];
  measurementIds: number[];
  photoIds: number[];
  symptomIds: string[];
  links: { id: number; expiresAt: string; revokedAt: string | null; createdAt: string }[];
}
export interface HelpRequestSummary {
  id: number;
  symptom: string;
  createdAt: string;
  pendingReplies: number;
}
export interface HelpLinkCreated {
  url: string;
  token: string;
  expiresAt: string;
}
/** A request on the bench of a technician or mentor of its restoration. */
export interface BenchHelpRequest {
  id: number;
  restorationId: number;
  set: string;
  symptom: string;
  createdAt: string;
}
