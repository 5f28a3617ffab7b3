import { z } from 'zod';
import { singleLineText } from '../text/plain-text.js';

/**
 * `technician` (fitter): sees approved revisions, their field cards and the register, records
 * field work and signs it; never sees drafts. Countersigning is for engineers and checkers.
 */
export const roles = ['engineer', 'checker', 'viewer', 'admin', 'technician'] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/**
 * Who countersigns a field record: the plant engineer (the viewer role) or an engineer (checkers
 * are engineers too), never the person who made or signed it. The server enforces it.
 */
export const fieldRecordCountersigners = [
  'viewer',
  'engineer',
  'checker',
] as const satisfies Role[];

export const mayCountersign = (role: Role): boolean =>
  (fieldRecordCountersigners as readonly Role[]).includes(role);

/** Who makes (and signs their own) field records: fitters and engineers (checkers too). */
export const fieldRecorders = ['technician', 'engineer', 'checker'] as const satisfies Role[];

export const mayRecordFieldWork = (role: Role | undefined): boolean =>
  !!role && (fieldRecorders as readonly Role[]).includes(role);

export const userSchema = z.object({
  id: z.string().uuid(),
  email: z.string().email(),
  displayName: z.string(),
  initials: z.string(),
  role: roleSchema,
  active: z.boolean(),
  unitSystem: z.enum(['SI', 'US']),
  /** How the user types decimals: 'point' (2.5) or 'comma' (2,5). */
  numberFormat: z.enum(['point', 'comma']).default('point'),
});
export type User = z.infer<typeof userSchema>;

const password = z.string().min(12, 'at least 12 characters').max(200, 'at most 200 characters');

export const createUserSchema = z
  .object({
    email: z.string().trim().toLowerCase().email('not a valid e-mail address'),
    displayName: singleLineText({ min: 2, max: 120 }),
    initials: z
      .string()
      .trim()
      .regex(/^[A-Z]{2,4}$/, '2 to 4 capital letters'),
    role: roleSchema,
    password,
  })
  .strict();
export type CreateUserInput = z.infer<typeof createUserSchema>;

export const updateUserSchema = z
  .object({
    displayName: singleLineText({ min: 2, max: 120 }).optional(),
    initials: z
      .string()
      .trim()
      .regex(/^[A-Z]{2,4}$/, '2 to 4 capital letters')
      .optional(),
    role: roleSchema.optional(),
    active: z.boolean().optional(),
    unitSystem: z.enum(['SI', 'US']).optional(),
  })
  .strict();
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

export const userListSchema = z.object({ items: z.array(userSchema) });
export type UserList = z.infer<typeof userListSchema>;
