import { z } from 'zod';
import { ROLES } from '../auth/capabilities.ts';

export const roleSchema = z.enum(ROLES);

export const emailSchema = z
  .string()
  .trim()
  .min(3)
  .max(254)
  .email({ message: 'Enter a valid e-mail address.' })
  .transform((s) => s.toLowerCase());

/** Passwords for staff accounts: long rather than complicated. */
export const newPasswordSchema = z
  .string()
  .min(12, { message: 'Use at least 12 characters.' })
  .max(256);

/** What the API says about a user; never the password hash. */
export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  active: z.boolean(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type User = z.infer<typeof userSchema>;

/** The signed-in user as GET /api/me and sign-in return it. */
export const sessionUserSchema = userSchema.pick({ id: true, email: true, displayName: true, role: true });
export type SessionUser = z.infer<typeof sessionUserSchema>;

export const meResponseSchema = z.object({ user: sessionUserSchema.nullable() });
export type MeResponse = z.infer<typeof meResponseSchema>;

export const signInBodySchema = z.object({
  email: z.string().trim().min(1, { message: 'Enter your e-mail address.' }).max(254),
  password: z.string().min(1, { message: 'Enter your password.' }).max(256),
});
export type SignInBody = z.infer<typeof signInBodySchema>;

export const createUserBodySchema = z.object({
  email: emailSchema,
  displayName: z.string().trim().min(1, { message: 'Enter a name.' }).max(120),
  role: roleSchema,
  password: newPasswordSchema,
});
export type CreateUserBody = z.infer<typeof createUserBodySchema>;

export const updateUserBodySchema = z
  .object({
    role: roleSchema.optional(),
    active: z.boolean().optional(),
    displayName: z.string().trim().min(1, { message: 'Enter a name.' }).max(120).optional(),
  })
  .refine((b) => b.role !== undefined || b.active !== undefined || b.displayName !== undefined, {
    message: 'Say what to change: role, active or name.',
  });
export type UpdateUserBody = z.infer<typeof updateUserBodySchema>;

export const userIdParamsSchema = z.object({ id: z.string().min(1).max(64) });

export const userListResponseSchema = z.object({ users: z.array(userSchema) });
export const userResponseSchema = z.object({ user: userSchema });
