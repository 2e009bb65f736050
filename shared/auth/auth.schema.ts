import { z } from 'zod';

export const ROLES = ['skipper', 'technician', 'manager'] as const;
export const RoleSchema = z.enum(ROLES);
export type Role = z.infer<typeof RoleSchema>;

/** Roles that belong to the workshop staff (may see every record of their workshop). */
export const STAFF_ROLES: readonly Role[] = ['technician', 'manager'];

export const EmailSchema = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .max(254, { error: 'An e-mail address has at most 254 characters.' })
  .pipe(z.email({ error: 'Enter a valid e-mail address, like name@example.com.' }));

export const PasswordSchema = z
  .string({ error: 'Enter a password.' })
  .min(10, { error: 'Use at least 10 characters for the password.' })
  .max(200, { error: 'Use at most 200 characters for the password.' });

export const SignInInputSchema = z.object({
  email: EmailSchema,
  // Sign-in accepts any non-empty password: length rules apply when one is set, not when checked.
  password: z
    .string({ error: 'Enter your password.' })
    .min(1, { error: 'Enter your password.' })
    .max(200),
});
export type SignInInput = z.infer<typeof SignInInputSchema>;

export const AcceptInviteInputSchema = z.object({
  token: z
    .string({ error: 'The invite link is incomplete.' })
    .min(20, { error: 'The invite link is incomplete.' })
    .max(200),
  name: z
    .string({ error: 'Enter your name.' })
    .trim()
    .min(1, { error: 'Enter your name.' })
    .max(120),
  password: PasswordSchema,
});
export type AcceptInviteInput = z.infer<typeof AcceptInviteInputSchema>;

export const InviteInputSchema = z.object({
  email: EmailSchema,
  role: RoleSchema,
  /** Vessels the invited skipper is linked to on acceptance. */
  vesselIds: z
    .array(z.uuid({ error: 'Each vessel must be chosen from the list.' }))
    .max(50)
    .default([]),
});
export type InviteInput = z.infer<typeof InviteInputSchema>;

export const SessionUserSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
  workshopId: z.string(),
  workshopName: z.string(),
});
export type SessionUser = z.infer<typeof SessionUserSchema>;

export const InvitePreviewSchema = z.object({
  email: z.string(),
  role: RoleSchema,
  workshopName: z.string(),
  expiresAt: z.string(),
});
export type InvitePreview = z.infer<typeof InvitePreviewSchema>;
