import { createHash, randomBytes } from 'node:crypto';
import { Op, Transaction } from 'sequelize';
import type { User } from '@/shared/api/auth';
import type { AcceptInvitationBody, InvitationBody, InvitationPreview, PendingInvitation } from '@/shared/api/team';
import { invitationEmail } from '@/server/mail/invitation-email';
import type { InvitationRow } from '@/server/models';
import { PASSWORDS_BUSY } from './auth';
import type { ServiceDeps } from './deps';
import { toPendingInvitation, toUser } from './dto';
import { PasswordsBusyError } from './passwords';
import { fail, ok, type Result } from './result';

export const INVITATION_DAYS = 7;
const DAY_MS = 24 * 60 * 60 * 1000;
const HOUR_MS = 60 * 60 * 1000;
/** Invitations one team may send in an hour: a busy onboarding day, not a mailing list. */
export const INVITATIONS_PER_HOUR = 20;
export const INVITATION_GONE =
  'This invitation link is no longer valid: it was used, withdrawn or has expired. Ask your team admin for a new one.';
export const SENDER_NOT_ADMIN =
  'This invitation no longer works: the person who sent it is no longer an admin of the team. Ask a current admin for a new one.';

/** The raw token lives only in the e-mailed link; the database keeps its sha256. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

export function createInvitationService({ sequelize, models, mailer, config, passwords }: ServiceDeps) {
  const { Team, User: Users, Invitation } = models;

  /**
   * The invitation behind a link, if it can still be used. An invitation lives only as long as its
   * sender is an admin of the team: a sender demoted or removed takes their open invitations with
   * them (they are withdrawn then, and this check holds even for one withdrawn some other way).
   */
  async function findUsable(token: string, transaction?: Transaction): Promise<Result<InvitationRow>> {
    const row = await Invitation.findOne({
      where: { tokenHash: hashToken(token), acceptedAt: null, expiresAt: { [Op.gt]: new Date() } },
      transaction,
    });
    if (!row) return fail('not-found', INVITATION_GONE);
    const sender = row.invitedById === null
      ? null
      : await Users.findOne({ where: { id: row.invitedById, teamId: row.teamId, role: 'admin', removedAt: null }, transaction });
    if (!sender) return fail('not-found', SENDER_NOT_ADMIN);
    if (row.revokedAt) return fail('not-found', INVITATION_GONE);
    return ok(row);
  }

  /** A removed member of the invitation's team comes back on accepting; any other account at that address is a conflict. */
  async function accountProblem(row: InvitationRow, transaction?: Transaction) {
    const existing = await Users.findOne({ where: { email: row.email }, transaction });
    const returning = existing?.removedAt && existing.teamId === row.teamId ? existing : null;
    const problem = existing && !returning ? fail('conflict', `${row.email} already has a Cablewright account. Sign in instead.`) : null;
    return { returning, problem };
  }

  /** At most INVITATIONS_PER_HOUR per team in any hour; the answer says when the next one may go. */
  async function overTeamLimit(teamId: number) {
    const since = new Date(Date.now() - HOUR_MS);
    const recent = await Invitation.findAll({
      attributes: ['createdAt'],
      where: { teamId, createdAt: { [Op.gt]: since } },
      order: [['createdAt', 'ASC']],
      limit: INVITATIONS_PER_HOUR,
    });
    if (recent.length < INVITATIONS_PER_HOUR) return null;
    const minutes = Math.max(1, Math.ceil((recent[0].createdAt.getTime() + HOUR_MS - Date.now()) / 60000));
    return fail('too-many', `Your team has sent ${INVITATIONS_PER_HOUR} invitations in the last hour. Wait ${minutes} minute${minutes === 1 ? '' : 's'} before sending another.`, {
      details: { retryAfterSeconds: minutes * 60 },
    });
  }

  /**
   * One account belongs to one team, so an address that has an account anywhere cannot be invited —
   * except a member this team removed: accepting the new invitation brings that account back.
   */
  async function addressTaken(admin: User, email: string): Promise<string | null> {
    const existing = await Users.findOne({ where: { email } });
    if (!existing) return null;
    // Said without naming or hinting at any other team: which teams an address belongs to is theirs.
    if (existing.teamId !== admin.teamId) return `${email} already has a Cablewright account, so it cannot be invited. Ask them for another address.`;
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
      const limited = await overTeamLimit(admin.teamId);
      if (limited) return limited;
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
      const found = await findUsable(token);
      if (!found.ok) return found;
      const row = found.value;
      const team = await Team.findByPk(row.teamId);
      if (!team) return fail('not-found', INVITATION_GONE);
      return ok({ email: row.email, role: row.role, teamName: team.name, expiresAt: row.expiresAt.toISOString() });
    },

    /**
     * The link is looked up first: an unknown, used or dead link costs one indexed query and no
     * password hash. Then the password is hashed (outside the write lock), and the link is checked,
     * marked used and the account created in one write transaction, so a link cannot be used twice.
     */
    async accept(token: string, body: AcceptInvitationBody): Promise<Result<User>> {
      const found = await findUsable(token);
      if (!found.ok) return found;
      const early = await accountProblem(found.value);
      if (early.problem) return early.problem;
      let passwordHash: string;
      try {
        passwordHash = await passwords.hash(body.password);
      } catch (error) {
        if (error instanceof PasswordsBusyError) return fail('busy', PASSWORDS_BUSY);
        throw error;
      }
      return sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction): Promise<Result<User>> => {
        const again = await findUsable(token, transaction);
        if (!again.ok) return again;
        const row = again.value;
        const { returning, problem } = await accountProblem(row, transaction);
        if (problem) return problem;
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
