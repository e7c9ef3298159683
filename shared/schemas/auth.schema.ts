import { z } from 'zod';

const Email = z
  .string()
  .trim()
  .toLowerCase()
  .max(254)
  .pipe(z.email({ message: 'must be an e-mail address' }));

/** Long passphrases welcome; the floor follows NIST SP 800-63B (at least 8 characters). */
const NewPassword = z
  .string()
  .min(8, { message: 'must be at least 8 characters' })
  .max(200, { message: 'must be at most 200 characters' });

export const RegisterBody = z.object({
  name: z.string().trim().min(1, { message: 'is required' }).max(120),
  email: Email,
  password: NewPassword,
});
export type RegisterBody = z.infer<typeof RegisterBody>;

export const LoginBody = z.object({
  email: Email,
  password: z.string().min(1, { message: 'is required' }).max(200),
});
export type LoginBody = z.infer<typeof LoginBody>;

export const RequestPasswordResetBody = z.object({ email: Email });
export type RequestPasswordResetBody = z.infer<typeof RequestPasswordResetBody>;

export const ResetPasswordBody = z.object({
  token: z.string().min(20).max(200),
  password: NewPassword,
});
export type ResetPasswordBody = z.infer<typeof ResetPasswordBody>;

export const VerifyEmailBody = z.object({ token: z.string().min(20).max(200) });
export type VerifyEmailBody = z.infer<typeof VerifyEmailBody>;
