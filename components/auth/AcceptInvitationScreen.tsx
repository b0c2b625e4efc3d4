import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { AuthFrame } from '@/components/auth/AuthFrame';
import { AcceptInvitationForm } from '@/components/auth/AcceptInvitationForm';
import { Badge, Banner, Button, Card, Heading, LabeledValue, Text, colors, space } from '@/components/ui';
import { roleTone } from '@/components/team/roleTone';
import { useMe } from '@/lib/api/auth';
import { useInvitationPreview } from '@/lib/api/team';
import { formatDate, roleLabel } from '@/lib/format';

export function AcceptInvitationScreen({ token }: { token: string }) {
  const preview = useInvitationPreview(token);
  const me = useMe();
  return (
    <AuthFrame>
      <Card testID="accept-invitation">
        <Heading level={1}>Join your team</Heading>
        {preview.isPending ? <ActivityIndicator color={colors.primary} /> : null}
        {preview.isError ? <InvitationUnavailable message={preview.error.message} /> : null}
        {preview.data ? (
          <>
            <View style={styles.facts}>
              <LabeledValue label="Team" value={preview.data.teamName} testID="invitation-team" />
              <LabeledValue label="E-mail" value={preview.data.email} testID="invitation-email" />
              <View style={styles.fact}>
                <Text variant="small" color="inkMuted">
                  Role
                </Text>
                <Badge label={roleLabel(preview.data.role)} tone={roleTone[preview.data.role]} testID="invitation-role" />
              </View>
              <Text variant="small" color="inkMuted">
                {`This invitation is valid until ${formatDate(preview.data.expiresAt)}.`}
              </Text>
            </View>
            {me.data ? (
              <Banner tone="info" title={`You are signed in as ${me.data.name}`}>
                Joining signs this browser in as the new member instead.
              </Banner>
            ) : null}
            <AcceptInvitationForm token={token} />
          </>
        ) : null}
      </Card>
    </AuthFrame>
  );
}


/** The server's own sentence says why (used, withdrawn, expired); the way out is sign-in or a new link. */
function InvitationUnavailable({ message }: { message: string }) {
  return (
    <>
      <Banner tone="warning" title="This invitation cannot be used" testID="invitation-unavailable">
        {message}
      </Banner>
      <Link href="/sign-in" asChild>
        <Button label="Go to sign-in" variant="secondary" />
      </Link>
    </>
  );
}

const styles = StyleSheet.create({
  facts: { gap: space.md, padding: space.md, borderRadius: 10, backgroundColor: colors.paper },
  fact: { gap: 2 },
});
