import { z } from 'zod';
import { MIN_PASSWORD_LENGTH } from '../../lib/auth-client';

/* Client-only form schemas for the sign-in screens (better-auth owns these endpoints, not shared/schemas). */

const email = z
  .string()
  .trim()
  .min(1, 'Enter your e-mail address.')
  .pipe(z.email('Enter a valid e-mail address.'));
const newPassword = z
  .string()
  .min(MIN_PASSWORD_LENGTH, `Use at least ${MIN_PASSWORD_LENGTH} characters.`)
  .max(128, 'Use at most 128 characters.');

export const signInFormSchema = z.object({
  email,
  password: z.string().min(1, 'Enter your password.'),
});
export type SignInForm = z.infer<typeof signInFormSchema>;

export const signUpFormSchema = z
  .object({
    name: z.string().trim().min(1, 'Enter your name as it should appear on compliance sheets.').max(200),
    email,
    password: newPassword,
    confirm: z.string(),
  })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });
export type SignUpForm = z.infer<typeof signUpFormSchema>;

export const forgotFormSchema = z.object({ email });
export type ForgotForm = z.infer<typeof forgotFormSchema>;

export const resetFormSchema = z
  .object({ password: newPassword, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });
export type ResetForm = z.infer<typeof resetFormSchema>;
