import type { MigrationModule } from './types';
import * as teamsAndUsers from './0001-teams-and-users';
import * as invitations from './0002-invitations';
import * as sessions from './0003-sessions';
import * as memberSoftRemoval from './0004-member-soft-removal';
import * as designsAndVersions from './0005-designs-and-versions';
import * as versionReports from './0006-version-reports';
import * as designsListIndex from './0007-designs-list-index';
import * as buildRecord from './0010-build-record';
import * as versionAfterOne from './0011-version-after-one';
import * as chapSecrets from './0012-chap-secrets';

/**
 * Every migration, in order. To add one: create `NNNN-what-it-does.ts` exporting `up` and `down`,
 * and append it here (a test checks that each file in this folder is listed). Never edit a released one.
 */
export const MIGRATIONS: ReadonlyArray<readonly [name: string, module: MigrationModule]> = [
  ['0001-teams-and-users', teamsAndUsers],
  ['0002-invitations', invitations],
  ['0003-sessions', sessions],
  ['0004-member-soft-removal', memberSoftRemoval],
  ['0005-designs-and-versions', designsAndVersions],
  ['0006-version-reports', versionReports],
  ['0007-designs-list-index', designsListIndex],
  ['0010-build-record', buildRecord],
  ['0011-version-after-one', versionAfterOne],
  ['0012-chap-secrets', chapSecrets],
];
