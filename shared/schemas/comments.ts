import { z } from 'zod';

/** A finding's thread: what a comment is sent as, edited with and read back as. */
export const commentInputSchema = z.object({
  body: z.string().trim().min(1, 'Write something first').max(8000, 'Keep a comment under 8,000 characters'),
  /** Internal comments stay between technicians and mentors; owners never receive them. */
  internal: z.boolean().default(true),
});
export const commentPatchSchema = z.object({ body: z.string().trim().min(1).max(8000) });

export const commentSchema = z.object({
  id: z.number().int(),
  findingId: z.number().int(),
  body: z.string(),
  internal: z.boolean(),
  authorId: z.number().int().nullable(),
  authorName: z.string().nullable(),
  mentions: z.array(z.number().int()),
  createdAt: z.string(),
  editedAt: z.string().nullable(),
  /** Deleted comments keep their place in the thread with an empty body. */
  deletedAt: z.string().nullable(),
});
export type Comment = z.infer<typeof commentSchema>;
