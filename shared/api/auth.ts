import { z } from 'zod';
import { ROLES } from '../roles';

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter an e-mail address like name@example.com' }));

export const signInBody = z
  .object({
    email: emailSchema,
    password: z.string().min(1, 'Enter your password').max(200),
  })
  .strict();
export type SignInBody = z.infer<typeof signInBody>;

/** New passwords: length over composition rules (NIST SP 800-63B, from memory); 12 characters is our own floor. */
export const newPasswordSchema = z
  .string()
  .min(12, 'Use at least 12 characters')
  .max(200, 'Use at most 200 characters');

export const roleSchema = z.enum(ROLES);

export const userSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  teamId: z.number().int(),
});
export type User = z.infer<typeof userSchema>;
