import { ActivityIndicator, Pressable, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Banner, Button, Card, EmptyState, Icon, Screen, Text, colors, space, TAP_TARGET } from '@/components/ui';
import { useDevMail } from '@/lib/api/mail';
import { formatDateTime } from '@/lib/format';
import type { MailMessage } from '@/shared/api/team';
import { usePressFeedback } from '@/lib/use-press-feedback';

/** Every e-mail the app sent while running with its local mail sink, newest first. */
export function MailboxScreen() {
  const mail = useDevMail();
  const messages = [...(mail.data ?? [])].sort((a, b) => b.date.localeCompare(a.date));
  return (
    <Screen title="Mailbox" intro="E-mail Cablewright has sent while running with its local mail sink. Nothing here left this machine." testID="mailbox-screen">
      {mail.isPending ? <ActivityIndicator color={colors.primary} /> : null}
      {mail.isError ? (
        <Banner tone="error" title="The mailbox could not be read" action={<Button label="Try again" variant="secondary" size="compact" onPress={() => void mail.refetch()} />}>
          {mail.error.message}
        </Banner>
      ) : null}
      {mail.data && messages.length === 0 ? (
        <EmptyState icon="mailbox" title="No e-mail yet" testID="mailbox-empty">
          Invitations you send from the Team screen arrive here within a few seconds.
        </EmptyState>
      ) : null}
      {messages.length > 0 ? (
        <Card padded={false} testID="mailbox-list">
          {messages.map((message, i) => (
            <MessageRow key={message.id} message={message} first={i === 0} />
          ))}
        </Card>
      ) : null}
    </Screen>
  );
}

function MessageRow({ message, first }: { message: MailMessage; first: boolean }) {
  const { pressed, handlers } = usePressFeedback();
  return (
    <Link href={{ pathname: '/mailbox/[id]', params: { id: message.id } }} asChild>
      <Pressable
        role="link"
        testID="mail-row"
        aria-label={`${message.subject}, to ${message.to.join(', ')}`}
        {...handlers}
        style={StyleSheet.flatten([styles.row, !first && styles.divider, pressed && styles.pressed])}
      >
        <View style={styles.text}>
          <Text variant="bodyStrong" numberOfLines={2}>
            {message.subject || '(no subject)'}
          </Text>
          <Text variant="small" color="inkMuted" numberOfLines={1}>
            {`To ${message.to.join(', ')} · ${formatDateTime(message.date)}`}
          </Text>
        </View>
        <Icon name="chevron" size={20} color="inkMuted" />
      </Pressable>
    </Link>
  );
}

const styles = StyleSheet.create({
  row: { minHeight: TAP_TARGET + 20, flexDirection: 'row', alignItems: 'center', gap: space.md, paddingHorizontal: space.lg, paddingVertical: space.md },
  divider: { borderTopWidth: 1, borderTopColor: colors.line },
  pressed: { backgroundColor: colors.surfaceSunken },
  text: { flex: 1, gap: 2 },
});
