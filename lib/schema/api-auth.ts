/**
 * Request and reply contracts of the account endpoints (DEVELOPERS.md, HTTP API): sign up, sign in,
 * forgot/reset password, /api/me. Shared by the app (form validation, reply parsing) and the server
 * (body parsing), so both ends give the same messages.
 */
import { z } from 'zod';

export const unitSystemSchema = z.enum(['si', 'ip']);
export type UnitSystem = z.infer<typeof unitSystemSchema>;

export const roleSchema = z.enum(['owner', 'designer', 'reviewer', 'viewer']);
export type Role = z.infer<typeof roleSchema>;

export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 200;

export const emailSchema = z
  .string()
  .trim()
  .min(1, 'Enter your e-mail address.')
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email('Enter an e-mail address like name@example.com.'));

export const newPasswordSchema = z
  .string()
  .min(PASSWORD_MIN_LENGTH, `Use at least ${PASSWORD_MIN_LENGTH} characters.`)
  .max(PASSWORD_MAX_LENGTH, `Use at most ${PASSWORD_MAX_LENGTH} characters.`);

export const personNameSchema = z
  .string()
  .trim()
  .min(1, 'Enter your name.')
  .max(100, 'Keep the name under 100 characters.');

export const signUpBodySchema = z.object({
  email: emailSchema,
  password: newPasswordSchema,
  name: personNameSchema,
});
export type SignUpBody = z.infer<typeof signUpBodySchema>;

export const signInBodySchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password.').max(PASSWORD_MAX_LENGTH, 'That password is too long.'),
});
export type SignInBody = z.infer<typeof signInBodySchema>;

export const forgotPasswordBodySchema = z.object({ email: emailSchema });
export type ForgotPasswordBody = z.infer<typeof forgotPasswordBodySchema>;

export const resetPasswordBodySchema = z.object({
  token: z.string().min(1, 'The reset link is missing its token. Open the link from the e-mail again.'),
  password: newPasswordSchema,
});
export type ResetPasswordBody = z.infer<typeof resetPasswordBodySchema>;

export const userSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  unitSystem: unitSystemSchema,
});
export type User = z.infer<typeof userSchema>;

export const userReplySchema = z.object({ user: userSchema });
export type UserReply = z.infer<typeof userReplySchema>;

export const teamMembershipSchema = z.object({ id: z.string(), name: z.string(), role: roleSchema });
export type TeamMembership = z.infer<typeof teamMembershipSchema>;

export const meReplySchema = z.object({ user: userSchema, teams: z.array(teamMembershipSchema) });
export type MeReply = z.infer<typeof meReplySchema>;

export const updateMeBodySchema = z
  .object({ name: personNameSchema.optional(), unitSystem: unitSystemSchema.optional() })
  .refine((b) => b.name !== undefined || b.unitSystem !== undefined, { message: 'Nothing to change.' });
export type UpdateMeBody = z.infer<typeof updateMeBodySchema>;
