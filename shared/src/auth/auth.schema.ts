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
