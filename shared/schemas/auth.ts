import { z } from 'zod';

import './error-map';

// The sign-in forms' schemas (better-auth validates again on the server).
export const emailSchema = z.email('Enter an e-mail address.').max(254);
export const passwordSchema = z.string().min(10, 'The password needs at least 10 characters.').max(128, 'The password can be at most 128 characters.');

/** A person's or a household's name, in the forms and on every server route. */
export const NAME_MAX = 80;

export const signUpSchema = z.object({ name: z.string().trim().min(1, 'Tell us your name.').max(NAME_MAX), email: emailSchema, password: passwordSchema });
export type SignUpForm = z.infer<typeof signUpSchema>;

export const signInSchema = z.object({ email: emailSchema, password: z.string().min(1, 'Enter your password.') });
export type SignInForm = z.infer<typeof signInSchema>;

export const forgotPasswordSchema = z.object({ email: emailSchema });
export type ForgotPasswordForm = z.infer<typeof forgotPasswordSchema>;

export const resetPasswordSchema = z
  .object({ password: passwordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two passwords differ.' });
export type ResetPasswordForm = z.infer<typeof resetPasswordSchema>;
