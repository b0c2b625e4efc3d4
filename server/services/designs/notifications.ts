import type { User } from '@/shared/api/auth';
import type { ReviewAction } from '@/shared/api/designs';
import type { ReportSummary } from '@/shared/analysis/summary';
import type { Role } from '@/shared/roles';
import { reviewEmail } from '@/server/mail/review-email';
import type { DesignRow, DesignVersionRow, ReviewEventRow, UserRow } from '@/server/models';
import type { DesignDeps } from './deps';

/**
 * Who hears about a review step, and the sending. E-mails go out after the step is committed; a relay
 * failure is logged and does not undo the step — the review thread on the design is the record, the
 * e-mail only a nudge. Removed members get nothing.
 */
export function createReviewNotifier({ models, mailer, appUrl }: Pick<DesignDeps, 'models' | 'mailer' | 'appUrl'>) {
  async function active(teamId: number, where: { role?: Role; id?: number }): Promise<UserRow[]> {
    return models.User.findAll({ where: { teamId, removedAt: null, ...where }, order: [['id', 'ASC']] });
  }

  /**
   * submit → the team's reviewers (or, in a team without one, its admins, who may review too);
   * request-changes → the version's author; approve → the author and the team's installers.
   * The version's author is never asked to review it, and nobody is told about their own step.
   */
  async function recipients(action: ReviewAction, teamId: number, authorId: number, actor: User): Promise<UserRow[]> {
    if (action === 'submit') {
      const eligible = (list: UserRow[]) => list.filter((u) => u.id !== authorId && u.id !== actor.id);
      const reviewers = eligible(await active(teamId, { role: 'reviewer' }));
      return reviewers.length > 0 ? reviewers : eligible(await active(teamId, { role: 'admin' }));
    }
    const author = await active(teamId, { id: authorId });
    const people = action === 'approve' ? [...author, ...(await active(teamId, { role: 'installer' }))] : author;
    const seen = new Set<number>();
    return people.filter((u) => u.id !== actor.id && !seen.has(u.id) && seen.add(u.id));
  }

  return {
    /** Send the e-mails of one committed review step; answers the addresses that were sent to. */
    async reviewed(actor: User, design: DesignRow, version: DesignVersionRow, event: ReviewEventRow): Promise<string[]> {
      const to = await recipients(event.action, design.teamId, version.authorId, actor);
      const path = `/designs/${design.id}/versions/${version.number}${event.action === 'submit' ? '/report' : ''}`;
      const input = {
        teamId: design.teamId,
        action: event.action,
        designName: design.name,
        site: design.site,
        number: version.number,
        actorName: actor.name,
        comment: event.comment,
        override: event.override,
        summary: JSON.parse(version.summary) as ReportSummary,
        link: `${appUrl}${path}`,
      };
      const sent: string[] = [];
      for (const person of to) {
        try {
          await mailer.sendMail(reviewEmail(input, person.email));
          sent.push(person.email);
        } catch (error) {
          console.error(`Review e-mail to ${person.email} could not be sent:`, (error as Error).message);
        }
      }
      return sent;
    },
  };
}

export type ReviewNotifier = ReturnType<typeof createReviewNotifier>;
