import { z } from 'zod';

const email = z.string().trim().toLowerCase().pipe(z.email({ message: 'Enter an e-mail address like name@example.org' })).pipe(z.string().max(254));
// 10 characters is the floor NIST SP 800-63B (2017) sets at 8; we ask a little more. 200 keeps bcrypt's 72-byte cut honest.
const newPassword = z.string().min(10, 'Use at least 10 characters').max(200, 'Use at most 200 characters');

export const signInSchema = z.object({
  email,
  password: z.string().min(1, 'Enter your password').max(200, 'Use at most 200 characters'),
});
export type SignIn = z.infer<typeof signInSchema>;

export const registerSchema = z.object({
  email,
  password: newPassword,
  name: z.string().trim().min(1, 'Tell us your name').max(100, 'Use at most 100 characters'),
});
export type Register = z.infer<typeof registerSchema>;

export const passwordChangeSchema = z.object({
  currentPassword: z.string().min(1, 'Enter your current password').max(200),
  newPassword,
});
export type PasswordChange = z.infer<typeof passwordChangeSchema>;

export const passwordResetRequestSchema = z.object({ email });
export type PasswordResetRequest = z.infer<typeof passwordResetRequestSchema>;

export const passwordResetSchema = z.object({
  token: z.string().min(20, 'This reset link is incomplete').max(200),
  newPassword,
});
export type PasswordReset = z.infer<typeof passwordResetSchema>;

export const personSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  isAdmin: z.boolean(),
  createdAt: z.string(),
});
export type Person = z.infer<typeof personSchema>;

export const csrfTokenSchema = z.object({ token: z.string() });
