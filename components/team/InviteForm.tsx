import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Banner, Button, Card, Heading, SegmentedPicker, Text, TextField, space } from '@/components/ui';
import { useInvite } from '@/lib/api/team';
import { describeFailure, validate, type FieldErrors } from '@/lib/forms';
import { invitationBody } from '@/shared/api/team';
import { ROLES, ROLE_LABELS, type Role } from '@/shared/roles';

const ROLE_OPTIONS = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

const ROLE_HINTS: Record<Role, string> = {
  admin: 'Manages the team: invitations and roles. Can also design and review.',
  designer: 'Draws designs, saves versions and submits them for review.',
  reviewer: 'Tests submitted versions against failures and approves or sends them back.',
  installer: 'Works through approved cable schedules on site.',
};

/** Invite one person by e-mail with a role; the server sends the e-mail with their personal link. */
export function InviteForm() {
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<Role>('designer');
  const [errors, setErrors] = useState<FieldErrors>({});
  const [sentTo, setSentTo] = useState<string | null>(null);
  const invite = useInvite();
  const failure = describeFailure(invite.error);

  function submit() {
    setSentTo(null);
    const checked = validate(invitationBody, { email, role });
    setErrors(checked.errors ?? {});
    if (!checked.data) return;
    const body = checked.data;
    invite.mutate(body, {
      onSuccess: () => {
        setSentTo(body.email);
        setEmail('');
      },
    });
  }

  const fieldErrors = { ...failure.fields, ...errors };
  return (
    <Card testID="invite-form">
      <Heading level={2}>Invite someone</Heading>
      <TextField
        label="E-mail"
        testID="invite-email"
        value={email}
        onChangeText={setEmail}
        error={fieldErrors.email}
        autoCapitalize="none"
        autoComplete="email"
        inputMode="email"
        onSubmitEditing={submit}
      />
      <View style={styles.role}>
        <SegmentedPicker label="Role" options={ROLE_OPTIONS} value={role} onChange={setRole} error={fieldErrors.role} testID="invite-role" />
        <Text variant="small" color="inkMuted">
          {ROLE_HINTS[role]}
        </Text>
      </View>
      {failure.form ? (
        <Banner tone="error" title="Invitation not sent" testID="invite-error">
          {failure.form}
        </Banner>
      ) : null}
      {sentTo ? (
        <Banner
          tone="success"
          title="Invitation sent"
          testID="invite-sent"
          action={
            <Link href="/mailbox" asChild>
              <Button label="Open the mailbox" variant="ghost" size="compact" />
            </Link>
          }
        >
          {`${sentTo} gets an e-mail with a personal link to join.`}
        </Banner>
      ) : null}
      <View style={styles.actions}>
        <Button label="Send invitation" loadingLabel="Sending…" loading={invite.isPending} onPress={submit} testID="invite-submit" />
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  role: { gap: space.xs },
  actions: { flexDirection: 'row' },
});
