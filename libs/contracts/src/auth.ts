import { z } from 'zod';
import { roleSchema } from './roles';

/** Minimum password length; strength is also scored by zxcvbn-ts on the server (score ≥ 3). */
export const passwordMinLength = 12;

export const emailSchema = z.string().trim().toLowerCase().pipe(z.email({ message: 'Enter a valid e-mail address' })).pipe(z.string().max(254));
export const newPasswordSchema = z
  .string()
  .min(passwordMinLength, { message: `Use at least ${passwordMinLength} characters` })
  .max(256, { message: 'Use at most 256 characters' });

export const loginRequestSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, { message: 'Enter your password' }).max(256),
});
export type LoginRequest = z.infer<typeof loginRequestSchema>;

/** The signed-in user as the client sees it. */
export const sessionUserSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  organisationId: z.uuid(),
  organisationName: z.string(),
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

/** Returned by POST /api/auth/login and POST /api/auth/refresh; the refresh token travels only as an httpOnly cookie. */
export const tokenResponseSchema = z.object({
  accessToken: z.string(),
  /** Seconds until the access token expires. */
  expiresIn: z.number().int(),
  user: sessionUserSchema,
});
export type TokenResponse = z.infer<typeof tokenResponseSchema>;

export const acceptInvitationSchema = z.object({
  token: z.string().min(20).max(200),
  password: newPasswordSchema,
});
export type AcceptInvitationRequest = z.infer<typeof acceptInvitationSchema>;

export const forgotPasswordSchema = z.object({ email: emailSchema });
export type ForgotPasswordRequest = z.infer<typeof forgotPasswordSchema>;

export const resetPasswordSchema = z.object({
  token: z.string().min(20).max(200),
  password: newPasswordSchema,
});
export type ResetPasswordRequest = z.infer<typeof resetPasswordSchema>;

export const changePasswordSchema = z.object({
  currentPassword: z.string().min(1, { message: 'Enter your current password' }).max(256),
  newPassword: newPasswordSchema,
});
export type ChangePasswordRequest = z.infer<typeof changePasswordSchema>;

/** GET /api/auth/invitations/:token — what the accept page shows before the password is chosen. */
export const invitationPreviewSchema = z.object({
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  organisationName: z.string(),
  expiresAt: z.iso.datetime(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;
