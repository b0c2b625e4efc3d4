import type { User } from '@/shared/api/auth';
import type { Member, PendingInvitation } from '@/shared/api/team';
import type { InvitationRow, UserRow } from '@/server/models';

/** The public shapes of rows: never a password hash or a token hash. */
export function toUser(row: UserRow): User {
  return { id: row.id, email: row.email, name: row.name, role: row.role, teamId: row.teamId };
}

export function toMember(row: UserRow): Member {
  return { id: row.id, email: row.email, name: row.name, role: row.role, createdAt: row.createdAt.toISOString() };
}

export function toPendingInvitation(row: InvitationRow, invitedBy: UserRow | null): PendingInvitation {
  return {
    id: row.id,
    email: row.email,
    role: row.role,
    createdAt: row.createdAt.toISOString(),
    expiresAt: row.expiresAt.toISOString(),
    invitedBy: invitedBy ? { id: invitedBy.id, name: invitedBy.name } : null,
  };
}
