import { createHash, randomBytes } from 'node:crypto';
import { Op, Transaction } from 'sequelize';
import type { User } from '@/shared/api/auth';
import type { AcceptInvitationBody, InvitationBody, InvitationPreview, PendingInvitation } from '@/shared/api/team';
import { invitationEmail } from '@/server/mail/invitation-email';
import type { ServiceDeps } from './deps';
import { toPendingInvitation, toUser } from './dto';
import { fail, ok, type Result } from './result';

export const INVITATION_DAYS = 7;
const DAY_MS = 24 * 60 * 60 * 1000;
export const INVITATION_GONE =
  'This invitation link is no longer valid: it was used, withdrawn or has expired. Ask your team admin for a new one.';

/** The raw token lives only in the e-mailed link; the database keeps its sha256. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export function createInvitationService({ sequelize, models, mailer, config, passwords }: ServiceDeps) {
  const { Team, User: Users, Invitation } = models;

  function findUsable(token: string, transaction?: Transaction) {
    return Invitation.findOne({
      where: { tokenHash: hashToken(token), acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
      transaction,
    });
  }

  /**
   * One account belongs to one team, so an address that has an account anywhere cannot be invited —
   * except a member this team removed: accepting the new invitation brings that account back.
   */
  async function addressTaken(admin: User, email: string): Promise<string | null> {
    const existing = await Users.findOne({ where: { email } });
    if (!existing) return null;
    if (existing.teamId !== admin.teamId) {
      return `${email} already has a Cablewright account in another team; an account belongs to one team.`;
    }
    return existing.removedAt ? null : `${email} is already a member of this team.`;
  }

  return {
    /**
     * Mail goes out before the row is written: if the relay refuses, nothing has changed. A new invitation
     * for an address replaces that address's pending ones, so only the newest link works.
     */
    async invite(admin: User, body: InvitationBody): Promise<Result<PendingInvitation>> {
      const taken = await addressTaken(admin, body.email);
      if (taken) return fail('conflict', taken);
      const team = await Team.findByPk(admin.teamId);
      if (!team) return fail('not-found', 'Your team no longer exists.');
      const token = randomBytes(32).toString('base64url');
      const expiresAt = new Date(Date.now() + INVITATION_DAYS * DAY_MS);
      const link = `${config.appUrl}/invitations/${token}`;
      try {
        await mailer.sendMail(
          invitationEmail({ teamId: team.id, teamName: team.name, to: body.email, role: body.role, inviterName: admin.name, link, expiresAt }),
        );
      } catch (error) {
        console.error('Invitation e-mail could not be sent:', (error as Error).message);
        return fail('unavailable', 'The invitation e-mail could not be sent. Try again in a moment.');
      }
      const row = await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
        await Invitation.update(
          { revokedAt: new Date() },
          { where: { teamId: team.id, email: body.email, acceptedAt: null, revokedAt: null }, transaction },
        );
        return Invitation.create(
          { teamId: team.id, email: body.email, role: body.role, tokenHash: hashToken(token), invitedById: admin.id, expiresAt },
          { transaction },
        );
      });
      const inviter = await Users.findByPk(admin.id);
      return ok(toPendingInvitation(row, inviter));
    },

    async revoke(admin: User, invitationId: number): Promise<Result<null>> {
      const [count] = await Invitation.update(
        { revokedAt: new Date() },
        { where: { id: invitationId, teamId: admin.teamId, acceptedAt: null, revokedAt: null } },
      );
      return count === 1 ? ok(null) : fail('not-found', 'There is no such pending invitation in your team.');
    },

    async preview(token: string): Promise<Result<InvitationPreview>> {
      const row = await findUsable(token);
      const team = row ? await Team.findByPk(row.teamId) : null;
      if (!row || !team) return fail('not-found', INVITATION_GONE);
      return ok({ email: row.email, role: row.role, teamName: team.name, expiresAt: row.expiresAt.toISOString() });
    },

    /** Check, mark used and create the account in one write transaction, so a link cannot be used twice. */
    async accept(token: string, body: AcceptInvitationBody): Promise<Result<User>> {
      const passwordHash = await passwords.hash(body.password);
      return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction): Promise<Result<User>> => {
        const row = await findUsable(token, transaction);
        if (!row) return fail('not-found', INVITATION_GONE);
        const existing = await Users.findOne({ where: { email: row.email }, transaction });
        const returning = existing?.removedAt && existing.teamId === row.teamId ? existing : null;
        if (existing && !returning) {
          return fail('conflict', `${row.email} already has a Cablewright account. Sign in instead.`);
        }
        await row.update({ acceptedAt: new Date() }, { transaction });
        // A removed member coming back keeps their id, so their earlier versions and reviews are theirs again.
        const user = returning
          ? await returning.update({ name: body.name, role: row.role, passwordHash, removedAt: null }, { transaction })
          : await Users.create({ teamId: row.teamId, email: row.email, name: body.name, role: row.role, passwordHash }, { transaction });
        return ok(toUser(user));
      });
    },
  };
}

export type InvitationService = ReturnType<typeof createInvitationService>;
