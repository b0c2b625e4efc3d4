import type { MailMessage } from '@/shared/api/team';

/** A message the fake sink caught, with the team it was sent for (read from our own header). */
export type CaughtMessage = MailMessage & { teamId: number | null };

/** The fake sink's in-memory store: the newest `capacity` messages, so a long dev session cannot grow it without bound. */
export class Mailbox {
  private messages: CaughtMessage[] = [];
  constructor(private readonly capacity = 200) {}

  add(message: CaughtMessage): void {
    this.messages.unshift(message);
    if (this.messages.length > this.capacity) this.messages.length = this.capacity;
  }

  /** Newest first; only what was sent on behalf of `teamId`, so one team's admin never reads another's links. */
  forTeam(teamId: number): MailMessage[] {
    return this.messages.filter((m) => m.teamId === teamId).map(({ teamId: _team, ...message }) => message);
  }

  get size(): number {
    return this.messages.length;
  }
}
