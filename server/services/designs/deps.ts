import { Transaction } from 'sequelize';
import type { Mailer } from '@/server/mail/mailer';
import type { Analysis } from '@/server/services/analysis';
import type { ServiceDeps } from '@/server/services/deps';

/**
 * What the design services need. The demo seed builds them too, inside its own transaction and with
 * a backdated clock, so `mailer` is only the sending half and `now` is injectable.
 */
export type DesignDeps = Pick<ServiceDeps, 'sequelize' | 'models'> & {
  mailer: Pick<Mailer, 'sendMail'>;
  /** Base of the links in e-mails (config.appUrl). */
  appUrl: string;
  now: () => Date;
  /** Validation and analysis of documents, off the request thread (the seed runs its fixtures in process). */
  analysis: Analysis;
};

/**
 * An outer transaction to run inside (the seed's). When one is given the caller owns the commit, so
 * the services send no e-mail: a message about a change that could still roll back would be a lie.
 */
export type Within = { transaction?: Transaction };

/**
 * Run `work` in one IMMEDIATE transaction: SQLite takes the write lock at BEGIN, so two writers on the
 * same design queue (WAL + busy timeout, server/db.ts) instead of both reading the same "latest"
 * version. Inside an outer transaction `work` simply joins it.
 */
export function writeTransaction<T>(deps: Pick<DesignDeps, 'sequelize'>, within: Within, work: (t: Transaction) => Promise<T>): Promise<T> {
  if (within.transaction) return work(within.transaction);
  return deps.sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, work);
}
