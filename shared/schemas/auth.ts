import { z } from 'zod';

export const PASSWORD_MIN = 10;

const email = z.string().trim().max(254).pipe(z.email('Enter an e-mail address such as name@example.org'));
const password = z
  .string()
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters; a few unrelated words make a strong password`)
  .max(200, 'Use at most 200 characters')
  // Tabs, line breaks, NUL and other control characters cannot be typed reliably, and some stores cut at NUL.
  .refine(
    (p) => !/\p{Cc}/u.test(p),
    'Use letters, digits, spaces and punctuation only: no tabs, line breaks or other control characters',
  );

export const signUpSchema = z.object({
  name: z.string().trim().min(1, 'Enter your name as others should see it').max(100),
  email,
  password,
  /** Signing up from an invitation link proves the address, so the account is ready at once. */
  invitationToken: z.string().min(20).max(200).optional(),
});
export type SignUpInput = z.input<typeof signUpSchema>;

export const signInSchema = z.object({
  email,
  password: z.string().min(1, 'Enter your password').max(200),
  remember: z.boolean().default(false),
});
export type SignInInput = z.input<typeof signInSchema>;

export const passwordResetRequestSchema = z.object({ email });
export const passwordResetConfirmSchema = z.object({ token: z.string().min(20).max(200), password });

export const confirmEmailSchema = z.object({ token: z.string().min(20).max(200) });

export const userSchema = z.object({ id: z.number().int(), name: z.string(), email: z.string() });
export type User = z.infer<typeof userSchema>;

/** Sign-up answers either with the signed-in user (from an invitation) or "check your e-mail". */
export const signUpResultSchema = z.discriminatedUnion('status', [
  z.object({ status: z.literal('signed-in'), user: userSchema, restorationId: z.number().int().optional() }),
  z.object({ status: z.literal('check-email') }),
]);
export type SignUpResult = z.infer<typeof signUpResultSchema>;

/** Answer of POST /api/auth/password-reset: the same words whether or not the address has an account. */
export const passwordResetRequestedSchema = z.object({ message: z.string() });

/** `GET /api/auth/session`: the signed-in person, or null when nobody is. */
export const sessionSchema = z.object({ user: userSchema.nullable() });
export type Session = z.infer<typeof sessionSchema>;
