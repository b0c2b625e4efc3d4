import { StyleSheet, View } from 'react-native';
import { useRouter } from 'expo-router';
import { Badge, Banner, Button, Card, Icon, LabeledValue, Screen, Text, space } from '@/components/ui';
import { roleTone } from '@/components/team/roleTone';
import { useMe, useSignOut } from '@/lib/api/auth';
import { useTeam } from '@/lib/api/team';
import { roleLabel } from '@/lib/format';

export function AccountScreen() {
  const me = useMe();
  const team = useTeam();
  const signOut = useSignOut();
  const router = useRouter();
  const user = me.data;
  if (!user) return null;
  return (
    <Screen title="Account" intro="Who you are signed in as, and in which team." testID="account-screen">
      <Card>
        <LabeledValue label="Name" value={user.name} testID="account-name" />
        <LabeledValue label="E-mail" value={user.email} testID="account-email" />
        <View style={styles.row}>
          <Text variant="small" color="inkMuted">
            Role
          </Text>
          <Badge label={roleLabel(user.role)} tone={roleTone[user.role]} testID="account-role" />
        </View>
        <LabeledValue label="Team" value={team.data?.team.name ?? '…'} testID="account-team" />
      </Card>
      {signOut.isError ? (
        <Banner tone="error" title="Still signed in">
          {signOut.error.message}
        </Banner>
      ) : null}
      <View style={styles.actions}>
        <Button
          label="Sign out"
          variant="secondary"
          icon={<Icon name="signOut" size={20} color="primary" />}
          loading={signOut.isPending}
          loadingLabel="Signing out…"
          onPress={() => signOut.mutate(undefined, { onSuccess: () => router.replace('/sign-in') })}
          testID="sign-out"
        />
      </View>
    </Screen>
  );
}


const styles = StyleSheet.create({
  row: { gap: 2 },
  actions: { flexDirection: 'row' },
});
