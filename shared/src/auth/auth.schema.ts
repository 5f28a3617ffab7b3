import { z } from 'zod';
import { userSchema } from '../users/user.schema.js';

export const signInSchema = z
  .object({
    email: z.string().trim().toLowerCase().email('not a valid e-mail address'),
    password: z.string().min(1, 'required'),
  })
  .strict();
export type SignInInput = z.infer<typeof signInSchema>;

/**
 * Answer to sign-in and refresh. The refresh token travels only in an httpOnly cookie
 * (`hf_refresh`, path /api/auth), never in the body.
 */
export const sessionSchema = z.object({
  accessToken: z.string(),
  /** Seconds until the access token expires. */
  expiresIn: z.number().int().positive(),
  user: userSchema,
});
export type Session = z.infer<typeof sessionSchema>;

export const healthSchema = z.object({
  status: z.enum(['ok', 'degraded']),
  database: z.enum(['ok', 'down']),
  version: z.string(),
});
export type Health = z.infer<typeof healthSchema>;

/** PATCH /api/auth/me: a user's own preferences (either or both). */
export const updateMeSchema = z
  .object({
    unitSystem: z.enum(['SI', 'US']).optional(),
    numberFormat: z.enum(['point', 'comma']).optional(),
  })
  .strict();
export type UpdateMeInput = z.infer<typeof updateMeSchema>;

/** A new password as typed; the server also refuses common and guessable ones (zxcvbn). */
export const newPasswordSchema = z
  .string()
  .min(12, 'at least 12 characters')
  .max(200, 'at most 200 characters');

/** POST /api/auth/password: a signed-in user changes their own password. */
export const changePasswordSchema = z
  .object({ currentPassword: z.string().min(1, 'required'), newPassword: newPasswordSchema })
  .strict();
export type ChangePasswordInput = z.infer<typeof changePasswordSchema>;

/** POST /api/auth/password-reset: the token from the mailed link and the new password. */
export const completePasswordResetSchema = z
  .object({ token: z.string().min(20).max(200), newPassword: newPasswordSchema })
  .strict();
export type CompletePasswordResetInput = z.infer<typeof completePasswordResetSchema>;

/** Answer to POST /api/users/:id/password-reset (admin). */
export const passwordResetIssuedSchema = z.object({
  sentTo: z.string(),
  expiresAt: z.string(),
});
export type PasswordResetIssued = z.infer<typeof passwordResetIssuedSchema>;
