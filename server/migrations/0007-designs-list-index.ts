import type { Migration } from './types';

/**
 * The designs list pages a team's designs most recently changed first (server/services/designs/list.ts):
 * this index hands it a page in order without sorting the whole team.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.addIndex('designs', ['teamId', 'updatedAt', 'id'], { name: 'designs_team_updated' });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeIndex('designs', 'designs_team_updated');
};
