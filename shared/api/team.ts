import { z } from 'zod';
import { emailSchema, newPasswordSchema, roleSchema } from './auth';
import type { Role } from '../roles';

export const invitationBody = z.object({ email: emailSchema, role: roleSchema }).strict();
export type InvitationBody = z.infer<typeof invitationBody>;

export const acceptInvitationBody = z
  .object({
    name: z.string().trim().min(1, 'Enter your name').max(120, 'Use at most 120 characters'),
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
