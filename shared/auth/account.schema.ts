import { z } from 'zod';
import { EmailSchema, PasswordSchema, RoleSchema } from './auth.schema.js';

/** Changing one's own password: the current one proves it is the owner, not a borrowed phone. */
export const ChangePasswordInputSchema = z.object({
  currentPassword: z
    .string({ error: 'Enter your current password.' })
    .min(1, { error: 'Enter your current password.' })
    .max(200),
  newPassword: PasswordSchema,
});
export type ChangePasswordInput = z.infer<typeof ChangePasswordInputSchema>;

export const PasswordResetRequestSchema = z.object({ email: EmailSchema });
export type PasswordResetRequest = z.infer<typeof PasswordResetRequestSchema>;

export const ResetTokenSchema = z
  .string({ error: 'The reset link is incomplete.' })
  .min(20, { error: 'The reset link is incomplete.' })
  .max(200, { error: 'The reset link is not valid.' });

export const ResetPasswordInputSchema = z.object({
  token: ResetTokenSchema,
  password: PasswordSchema,
});
export type ResetPasswordInput = z.infer<typeof ResetPasswordInputSchema>;

/** Whom a reset link is for, shown before the new password is chosen. */
export const ResetPreviewSchema = z.object({ email: z.string(), expiresAt: z.string() });
export type ResetPreview = z.infer<typeof ResetPreviewSchema>;

/** The signed-in person's own account page. */
export const AccountViewSchema = z.object({
  email: z.string(),
  name: z.string(),
  /** Devices and browsers where this account is signed in now, this one included. */
  sessions: z.number().int(),
  passwordChangedAt: z.string().nullable(),
});
export type AccountView = z.infer<typeof AccountViewSchema>;

export const ChangeRoleInputSchema = z.object({ role: RoleSchema });
export type ChangeRoleInput = z.infer<typeof ChangeRoleInputSchema>;

/** One line of the team's account history: who changed what about whose account. */
export const AccountChangeSchema = z.object({
  id: z.string(),
  at: z.string(),
  action: z.string(),
  actorName: z.string(),
  detail: z.string(),
});
export type AccountChange = z.infer<typeof AccountChangeSchema>;
