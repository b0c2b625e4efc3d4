import { z } from 'zod';
import { emailSchema, newPasswordSchema, personName, roleSchema } from './auth';
import type { Role } from '../roles';
import { idParam } from './common';

export const invitationBody = z.object({ email: emailSchema, role: roleSchema }).strict();
export type InvitationBody = z.infer<typeof invitationBody>;

export const acceptInvitationBody = z
  .object({
    name: personName,
    password: newPasswordSchema,
  })
  .strict();
export type AcceptInvitationBody = z.infer<typeof acceptInvitationBody>;

export const memberPatchBody = z.object({ role: roleSchema }).strict();
export type MemberPatchBody = z.infer<typeof memberPatchBody>;

export type Team = { id: number; name: string };
export type Member = { id: number; email: string; name: string; role: Role; createdAt: string };
export type PendingInvitation = {
  id: number;
  email: string;
  role: Role;
  createdAt: string;
  expiresAt: string;
  invitedBy: { id: number; name: string } | null;
};
/** GET /api/team — `invitations` is present for admins only. */
export type TeamResponse = { team: Team; members: Member[]; invitations?: PendingInvitation[] };
/** GET /api/invitations/:token — what the accept screen shows before the invitee sets a password. */
export type InvitationPreview = { email: string; role: Role; teamName: string; expiresAt: string };

/** One message caught by the local mail sink (MAIL=fake), GET /api/dev/mail. */
export type MailMessage = {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  date: string;
};

/** `:id` of a member or an invitation. */
export const idParams = z.object({ id: idParam }).strict();
export type IdParams = z.infer<typeof idParams>;

/** An invitation token is 32 random bytes in base64url: exactly 43 characters of A–Z a–z 0–9 - _. */
export const invitationTokenParams = z
  .object({ token: z.string().regex(/^[A-Za-z0-9_-]{43}$/, 'This is not an invitation link') })
  .strict();
export type InvitationTokenParams = z.infer<typeof invitationTokenParams>;
