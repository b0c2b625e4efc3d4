import { z } from 'zod';
import { ROLES } from '../roles';
import { cleanText } from '../text/clean';
import { utf8Length } from '../text/utf8';

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter an e-mail address like name@example.com' }));

/**
 * Sign-in takes any password up to a generous length, so a long one fails like any wrong one (401)
 * rather than as a malformed request; no stored password is longer than PASSWORD_MAX_BYTES.
 */
export const signInBody = z
  .object({
    email: emailSchema,
    password: z.string().min(1, 'Enter your password').max(1024, 'Use at most 1024 characters'),
  })
  .strict();
export type SignInBody = z.infer<typeof signInBody>;

/** bcrypt reads only the first 72 bytes of a password (Provos & Mazières 1999; bcryptjs does the same). */
export const PASSWORD_MAX_BYTES = 72;

/**
 * New passwords: length over composition rules (NIST SP 800-63B, from memory); 12 characters is our
 * own floor. At most 72 bytes of UTF-8: beyond that bcrypt would silently ignore the rest, so a
 * longer password is refused rather than quietly shortened.
 */
export const newPasswordSchema = z
  .string()
  .min(12, 'Use at least 12 characters')
  .refine(
    (password) => utf8Length(password) <= PASSWORD_MAX_BYTES,
    `Use at most ${PASSWORD_MAX_BYTES} bytes: only that much of a password is checked (a letter with an accent takes 2, many other characters 3 or 4)`,
  );

/** A person's name as they type it, with control and text-direction characters taken out. */
export const personName = z
  .string()
  .transform(cleanText)
  .pipe(z.string().trim().min(1, 'Enter your name').max(120, 'Use at most 120 characters'));

export const roleSchema = z.enum(ROLES);

export const userSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
  teamId: z.number().int(),
});
export type User = z.infer<typeof userSchema>;
