import { z } from 'zod';

/** Every code the server puts in an error answer; the client branches on these, test fakes may use only these. */
export const apiErrorCodes = [
  'bad_request',
  'bad_origin',
  'unauthorized',
  'email_unconfirmed',
  'forbidden',
  'not_found',
  'conflict',
  'gone',
  'too_large',
  'unsupported_type',
  'damaged_image',
  'too_many_requests',
  'mail_unavailable',
  'internal',
] as const;
export type ApiErrorCode = (typeof apiErrorCodes)[number];

/** Every API error has this shape (PRODUCT.md, API section). */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    details: z.unknown().optional(),
  }),
});
export type ApiError = z.infer<typeof apiErrorSchema>;

/** The same shape with the code checked against the list: what tests hold the server and the fakes to. */
export const knownApiErrorSchema = z
  .object({
    error: z
      .object({ code: z.enum(apiErrorCodes), message: z.string().min(1), details: z.unknown().optional() })
      .strict(),
  })
  .strict();
