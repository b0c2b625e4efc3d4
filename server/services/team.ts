import { Op, type Transaction } from 'sequelize';
import type { User } from '@/shared/api/auth';
import type { Member, TeamResponse } from '@/shared/api/team';
import { can, type Role } from '@/shared/roles';
import type { InvitationRow, UserRow } from '@/server/models';
import type { ServiceDeps } from './deps';
import { toMember, toPendingInvitation } from './dto';
import { fail, ok, type Result } from './result';

const NO_SUCH_MEMBER = 'There is no such member in your team.';

export function createTeamService({ sequelize, models }: Pick<ServiceDeps, 'sequelize' | 'models'>) {
  const { Team, User: Users, Invitation, Session } = models;

  /** A member of the viewer's team; members of other teams are "not found" like ids that do not exist (docs/api.md). */
  async function findMember(viewer: User, memberId: number) {
    return Users.findOne({ where: { id: memberId, teamId: viewer.teamId, removedAt: null } });
  }

  return {
    async getTeam(viewer: User): Promise<Result<TeamResponse>> {
      const team = await Team.findByPk(viewer.teamId);
      if (!team) return fail('not-found', 'Your team no longer exists.');
      const members = await Users.findAll({ where: { teamId: team.id, removedAt: null }, order: [['name', 'ASC'], ['id', 'ASC']] });
      const response: TeamResponse = { team: { id: team.id, name: team.name }, members: members.map(toMember) };
      if (can(viewer.role, 'manageTeam')) {
        const pending = await Invitation.findAll({
          where: { teamId: team.id, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
          include: [{ model: Users, as: 'invitedBy' }],
          order: [['createdAt', 'DESC'], ['id', 'DESC']],
        });
        // The included inviter, removed or not: an invitation still says who sent it after they left.
        response.invitations = pending.map((row) => toPendingInvitation(row, (row as InvitationRow & { invitedBy?: UserRow | null }).invitedBy ?? null));
      }
      return ok(response);
    },

    /** Admins may not change their own role: a team must never be left without an admin by accident. */
    async changeRole(viewer: User, memberId: number, role: Role): Promise<Result<Member>> {
      const member = await findMember(viewer, memberId);
      if (!member) return fail('not-found', NO_SUCH_MEMBER);
      if (member.id === viewer.id && role !== member.role) {
        return fail('conflict', 'You cannot change your own role. Ask another admin to do it.');
      }
      if (member.role !== role) {
        await sequelize.transaction(async (transaction) => {
          await member.update({ role }, { transaction });
          if (role !== 'admin') await withdrawInvitationsOf(member.id, transaction);
        });
      }
      return ok(toMember(member));
    },

    /**
     * Removal is soft: the row stays so the versions and reviews they made keep naming them, but they
     * leave the members list, cannot sign in, every session of theirs ends at once, and the
     * invitations they sent stop working.
     */
    async removeMember(viewer: User, memberId: number): Promise<Result<null>> {
      const member = await findMember(viewer, memberId);
      if (!member) return fail('not-found', NO_SUCH_MEMBER);
      if (member.id === viewer.id) {
        return fail('conflict', 'You cannot remove yourself from the team. Ask another admin to do it.');
      }
      await sequelize.transaction(async (transaction) => {
        await Session.destroy({ where: { userId: member.id }, transaction });
        await member.update({ removedAt: new Date() }, { transaction });
        await withdrawInvitationsOf(member.id, transaction);
      });
      return ok(null);
    },
  };

  /**
   * An invitation lives only as long as its sender is an admin: one who is demoted or removed takes
   * their open invitations with them (invitations.ts checks the sender again when a link is used).
   */
  async function withdrawInvitationsOf(senderId: number, transaction: Transaction): Promise<void> {
    await Invitation.update({ revokedAt: new Date() }, { where: { invitedById: senderId, acceptedAt: null, revokedAt: null }, transaction });
  }
}

export type TeamService = ReturnType<typeof createTeamService>;
