import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Badge, Banner, Button, SegmentedPicker, Text, colors, space } from '@/components/ui';
import { ConfirmInline } from '@/components/team/ConfirmInline';
import { roleTone } from '@/components/team/roleTone';
import { useChangeRole, useRemoveMember } from '@/lib/api/team';
import { roleLabel } from '@/lib/format';
import { ROLES, ROLE_LABELS, type Role } from '@/shared/roles';
import type { Member } from '@/shared/api/team';

const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

type Mode = 'view' | 'role' | 'remove';

/** One member: name, e-mail and role; admins change the role or remove others (never themselves, here). */
export function MemberRow({ member, isSelf }: { member: Member; isSelf: boolean }) {
  const [mode, setMode] = useState<Mode>('view');
  const [role, setRole] = useState<Role>(member.role);
  const changeRole = useChangeRole();
  const remove = useRemoveMember();
  const error = changeRole.error ?? remove.error;
  const tid = `member-${member.id}`;

  return (
    <View style={styles.row} testID={tid}>
      <View style={styles.head}>
        <View style={styles.who}>
          <Text variant="bodyStrong">{isSelf ? `${member.name} (you)` : member.name}</Text>
          <Text variant="small" color="inkMuted">
            {member.email}
          </Text>
        </View>
        <Badge label={roleLabel(member.role)} tone={roleTone[member.role]} testID={`${tid}-role`} />
      </View>
      {!isSelf && mode === 'view' ? (
        <View style={styles.actions}>
          <Button label="Change role" variant="secondary" size="compact" onPress={() => setMode('role')} testID={`${tid}-change`} />
          <Button label="Remove" variant="ghost" size="compact" onPress={() => setMode('remove')} testID={`${tid}-remove`} />
        </View>
      ) : null}
      {mode === 'role' ? (
        <View style={styles.edit}>
          <SegmentedPicker label={`New role for ${member.name}`} options={ROLE_OPTIONS} value={role} onChange={setRole} testID={`${tid}-picker`} />
          <View style={styles.actions}>
            <Button
              label="Save role"
              size="compact"
              loading={changeRole.isPending}
              disabled={role === member.role}
              onPress={() => changeRole.mutate({ id: member.id, role }, { onSuccess: () => setMode('view') })}
              testID={`${tid}-save`}
            />
            <Button label="Cancel" variant="ghost" size="compact" onPress={() => { setRole(member.role); setMode('view'); }} />
          </View>
        </View>
      ) : null}
      {mode === 'remove' ? (
        <ConfirmInline
          question={`Remove ${member.name} from the team? They are signed out and can no longer see the team's designs.`}
          confirmLabel="Remove"
          busy={remove.isPending}
          onConfirm={() => remove.mutate(member.id)}
          onCancel={() => setMode('view')}
          testID={`${tid}-confirm`}
        />
      ) : null}
      {error ? (
        <Banner tone="error" title="Not changed">
          {error.message}
        </Banner>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: space.md, paddingVertical: space.md, borderTopWidth: 1, borderTopColor: colors.line },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: space.md },
  who: { flex: 1, gap: 2 },
  actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  edit: { gap: space.md },
});
