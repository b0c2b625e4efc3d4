import type { Sequelize, Transaction } from 'sequelize';
import type { User } from '@/shared/api/auth';
import type { ReviewBody } from '@/shared/api/designs';
import harborRoadV1 from '@/shared/fixtures/harbor-road-v1.json';
import harborRoadV2 from '@/shared/fixtures/harbor-road-v2.json';
import { directAttach } from '@/shared/patterns';
import type { Models } from '@/server/models';
import { inProcessAnalysis } from '@/server/services/analysis';
import { createDesignServices } from '@/server/services/designs';
import { toUser } from '@/server/services/dto';
import type { Result } from '@/server/services/result';
import type { SeededPeople } from './users';

const HOUR = 60 * 60 * 1000;
const DAY = 24 * HOUR;

/**
 * The demo designs (docs/demo.md), written through the same services as the API so the stored
 * summaries are real analyses. The history is backdated to the days before seeding, so the designs
 * screen reads like a week of work.
 *
 * Tidewater: "Harbor Road storage" v1 (the flawed first layout) submitted by Ravi and sent back by Theo;
 * v2 with both faults fixed, submitted and approved. Quayside: Sam's small direct-attach lab design, a draft.
 */
export async function seedDesigns(sequelize: Sequelize, models: Models, people: SeededPeople, transaction: Transaction): Promise<void> {
  const start = Date.now();
  let current = new Date(start);
  const at = (daysAgo: number, hour: number) => {
    current = new Date(Math.floor((start - daysAgo * DAY) / DAY) * DAY + hour * HOUR);
  };
  const services = createDesignServices({
    sequelize,
    models,
    appUrl: 'http://localhost',
    now: () => current,
    // The demo's own fixtures: analysed here, so seeding needs no analysis process.
    analysis: inProcessAnalysis(),
    mailer: {
      sendMail: () => Promise.reject(new Error('the demo seed sends no e-mail')),
    },
  });
  const within = { transaction };
  const person = (email: string): User => {
    const row = people.users.get(email);
    if (!row) throw new Error(`the demo seed has no ${email}`);
    return toUser(row);
  };
  const ravi = person('ravi@tidewater.example');
  const theo = person('theo@tidewater.example');
  const sam = person('sam@quayside.example');
  const review = async (who: User, designId: number, n: number, body: ReviewBody) =>
    must(await services.reviews.act(who, designId, n, body, within));

  at(9, 9);
  const harbor = must(
    await services.designs.create(
      ravi,
      {
        name: 'Harbor Road storage',
        site: 'Harbor Road server room',
        document: harborRoadV1,
        message: 'First layout of the Harbor Road server room: vault-1 on fab-a and fab-b, oob-1 for management, six hosts',
      },
      within,
    ),
  ).design.id;
  at(9, 11);
  await review(ravi, harbor, 1, { action: 'submit' });
  at(8, 14);
  await review(theo, harbor, 1, {
    action: 'request-changes',
    comment:
      'Two things to fix before this is built. cam-rec-2 is cabled only to fab-a: its card-2 port has no cable to fab-b, ' +
      'so fab-a, its card-1 and cable HR-A-10 are each a single point of failure for it. And the management port of ' +
      "vault-1's ctl-b is plugged into data switch fab-b; it belongs on oob-1.",
  });
  at(6, 10);
  must(
    await services.versions.save(
      ravi,
      harbor,
      { baseVersion: 1, message: "Cable cam-rec-2 card-2 to fab-b, move ctl-b's management port to oob-1, turn on mutual CHAP", document: harborRoadV2 },
      within,
    ),
  );
  at(6, 11);
  await review(ravi, harbor, 2, { action: 'submit', comment: 'Both points from the review of version 1 are fixed.' });
  at(5, 15);
  await review(theo, harbor, 2, {
    action: 'approve',
    comment: 'Every host reaches both controllers with no single point of failure, and management stays on oob-1. Approved for installation.',
  });

  at(2, 16);
  must(
    await services.designs.create(
      sam,
      {
        name: 'Quayside lab array',
        site: 'Quayside analytics lab',
        document: quaysideLab(),
        message: 'Two lab nodes cabled straight to the array controllers with direct-attach copper',
      },
      within,
    ),
  );
}

/** Invented: a small direct-attach array for Quayside's lab, RFC 5737 addresses from the pattern. */
function quaysideLab() {
  return directAttach({
    name: 'Quayside lab array',
    hosts: ['lab-node-1', 'lab-node-2'],
    arrayName: 'lab-array',
    speedGbps: 25,
    connector: 'sfp',
    iqnPrefix: 'iqn.2026-02.example.quayside',
    labelPrefix: 'QL-',
    chap: 'mutual',
  });
}

function must<T>(result: Result<T>): T {
  if (!result.ok) throw new Error(`The demo seed could not be written: ${result.message}`);
  return result.value;
}
