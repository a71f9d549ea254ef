import { z } from 'zod';
import { roleSchema, emailSchema, newPasswordSchema } from './users.ts';
import { tokenSchema } from './subscriptions.ts';

export const createInvitationBodySchema = z.object({
  email: emailSchema,
  displayName: z.string().trim().min(1, { message: 'Enter a name.' }).max(120),
  role: roleSchema,
});
export type CreateInvitationBody = z.input<typeof createInvitationBodySchema>;

export const invitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  status: z.enum(['pending', 'accepted', 'revoked']),
  invitedBy: z.string().nullable(),
  expiresAt: z.string(),
  createdAt: z.string(),
  acceptedAt: z.string().nullable(),
});
export type Invitation = z.infer<typeof invitationSchema>;
export const invitationResponseSchema = z.object({ invitation: invitationSchema });
export const invitationListSchema = z.object({ invitations: z.array(invitationSchema) });

/** What the invitee sees before choosing a password. */
export const invitationPreviewSchema = z.object({
  invitation: z.object({ email: z.string(), displayName: z.string(), role: roleSchema, expiresAt: z.string() }),
});

export const acceptInvitationBodySchema = z.object({
  token: tokenSchema,
  displayName: z.string().trim().min(1, { message: 'Enter your name.' }).max(120).optional(),
  password: newPasswordSchema,
});
export type AcceptInvitationBody = z.input<typeof acceptInvitationBodySchema>;
export const acceptedInvitationSchema = z.object({ status: z.literal('accepted'), email: z.string() });

export const passwordResetRequestBodySchema = z.object({ email: emailSchema });
export const passwordResetBodySchema = z.object({ token: tokenSchema, password: newPasswordSchema });
export type PasswordResetBody = z.input<typeof passwordResetBodySchema>;
export const passwordResetDoneSchema = z.object({ status: z.literal('password_set'), email: z.string() });
