import { EmptyState, Screen, Text } from '@/components/ui';
import { useMe } from '@/lib/api/auth';
import { useTeam } from '@/lib/api/team';
import { can } from '@/shared/roles';

/**
 * The team's designs. Designs and their versions are not in Cablewright yet, so this says so plainly
 * and what the list will hold, rather than offering buttons that do nothing.
 */
export function DesignsScreen() {
  const me = useMe();
  const team = useTeam();
  const role = me.data?.role;
  const teamName = team.data?.team.name ?? 'your team';
  return (
    <Screen title="Designs" intro={`Storage-network designs of ${teamName}.`} testID="designs-screen">
      <EmptyState icon="designs" title="No designs yet" testID="designs-empty">
        {`Designs arrive together with versions, the next part of Cablewright to be built. Then this page lists every design of ${teamName} with its status — draft, in review, approved or changes asked — and its latest version.`}
      </EmptyState>
      {role ? <Text color="inkMuted">{roleNote(role)}</Text> : null}
    </Screen>
  );
}

function roleNote(role: NonNullable<ReturnType<typeof useMe>['data']>['role']): string {
  if (role === 'installer') return 'As an installer you will see the approved versions here, with their cable schedules.';
  if (can(role, 'editDesigns')) return 'You will be able to start a design here, from scratch or from a pattern.';
  return 'You will find the versions waiting for your review here.';
}
