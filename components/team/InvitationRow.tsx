import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Badge, Banner, Button, Text, colors, space } from '@/components/ui';
import { ConfirmInline } from '@/components/team/ConfirmInline';
import { roleTone } from '@/components/team/roleTone';
import { useRevokeInvitation } from '@/lib/api/team';
import { formatDate, roleLabel } from '@/lib/format';
import type { PendingInvitation } from '@/shared/api/team';

export function InvitationRow({ invitation }: { invitation: PendingInvitation }) {
  const [confirming, setConfirming] = useState(false);
  const revoke = useRevokeInvitation();
  const tid = `invitation-${invitation.id}`;
  const by = invitation.invitedBy ? `Invited by ${invitation.invitedBy.name}` : 'Invited';
  return (
    <View style={styles.row} testID={tid}>
      <View style={styles.head}>
        <View style={styles.who}>
          <Text variant="bodyStrong">{invitation.email}</Text>
          <Text variant="small" color="inkMuted">
            {`${by} · valid until ${formatDate(invitation.expiresAt)}`}
          </Text>
        </View>
        <Badge label={roleLabel(invitation.role)} tone={roleTone[invitation.role]} />
      </View>
      {confirming ? (
        <ConfirmInline
          question={`Withdraw the invitation for ${invitation.email}? Its link stops working.`}
          confirmLabel="Withdraw"
          busy={revoke.isPending}
          onConfirm={() => revoke.mutate(invitation.id)}
          onCancel={() => setConfirming(false)}
          testID={`${tid}-confirm`}
        />
      ) : (
        <View style={styles.actions}>
          <Button label="Withdraw" variant="ghost" size="compact" onPress={() => setConfirming(true)} testID={`${tid}-revoke`} />
        </View>
      )}
      {revoke.isError ? (
        <Banner tone="error" title="Not withdrawn">
          {revoke.error.message}
        </Banner>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.sm, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.md },
  who: { flex: 1, gap: 2 },
  actions: { flexDirection: 'row' },
});
