import { ActivityIndicator } from 'react-native';
import { Banner, Button, Card, Heading, Screen, Text, colors } from '@/components/ui';
import { InvitationRow } from '@/components/team/InvitationRow';
import { InviteForm } from '@/components/team/InviteForm';
import { MemberRow } from '@/components/team/MemberRow';
import { useMe } from '@/lib/api/auth';
import { useTeam } from '@/lib/api/team';

export function TeamScreen() {
  const me = useMe();
  const team = useTeam({ fresh: true });
  const invitations = team.data?.invitations ?? [];
  return (
    <Screen title="Team" intro={team.data ? `People in ${team.data.team.name} and what each may do.` : undefined} testID="team-screen">
      <InviteForm />
      {team.isPending ? <ActivityIndicator color={colors.primary} /> : null}
      {team.isError ? (
        <Banner tone="error" title="The team could not be loaded" action={<Button label="Try again" variant="secondary" size="compact" onPress={() => void team.refetch()} />}>
          {team.error.message}
        </Banner>
      ) : null}
      {team.data ? (
        <>
          <Card testID="team-members">
            <Heading level={2}>{`Members (${team.data.members.length})`}</Heading>
            {team.data.members.map((member) => (
              <MemberRow key={member.id} member={member} isSelf={member.id === me.data?.id} />
            ))}
          </Card>
          <Card testID="team-invitations">
            <Heading level={2}>{`Pending invitations (${invitations.length})`}</Heading>
            {invitations.length === 0 ? (
              <Text color="inkMuted">No invitations are waiting. Invite someone above; they appear here until they join.</Text>
            ) : (
              invitations.map((invitation) => <InvitationRow key={invitation.id} invitation={invitation} />)
            )}
          </Card>
        </>
      ) : null}
    </Screen>
  );
}
