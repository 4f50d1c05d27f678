import { z } from 'zod';
import { emailRule } from '../../../lib/form-rules';

// The checks the auth forms make before anything is sent, in people's words (the server checks again).

const email = emailRule;

export const signInSchema = z.object({
  email,
  password: z.string().min(1, 'Type your password.').max(200, 'A password is at most 200 characters.'),
});
export type SignInValues = z.infer<typeof signInSchema>;

export const forgotPasswordSchema = z.object({ email });
export type ForgotPasswordValues = z.infer<typeof forgotPasswordSchema>;

/** A new password, typed twice (the server also refuses very common ones). */
export const newPasswordSchema = z
  .object({
    password: z.string().min(12, 'A password needs at least 12 characters.').max(64, 'A password is at most 64 characters.'),
    again: z.string().min(1, 'Type the new password again.'),
  })
  .refine((values) => values.password === values.again, { path: ['again'], message: 'The two passwords differ.' });
export type NewPasswordValues = z.infer<typeof newPasswordSchema>;

/** Changing one's password: the current one, then the new one twice. */
export const changePasswordSchema = z
  .object({
    currentPassword: z.string().min(1, 'Type your current password.').max(200, 'A password is at most 200 characters.'),
    newPassword: z.string().min(12, 'A password needs at least 12 characters.').max(64, 'A password is at most 64 characters.'),
    again: z.string().min(1, 'Type the new password again.'),
  })
  .refine((values) => values.newPassword === values.again, { path: ['again'], message: 'The two new passwords differ.' });
export type ChangePasswordValues = z.infer<typeof changePasswordSchema>;

/** One's display name, locale and e-mail preferences. */
export const settingsSchema = z.object({
  name: z.string().trim().min(1, 'Type the name others see on the Team and in the Activity.').max(120, 'A display name is at most 120 characters.'),
  locale: z.string(),
  emailReminders: z.boolean(),
  emailReceipts: z.boolean(),
});
export type SettingsValues = z.infer<typeof settingsSchema>;
