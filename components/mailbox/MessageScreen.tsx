import { ActivityIndicator, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Banner, Button, Card, Heading, Icon, Screen, Text, colors, space } from '@/components/ui';
import { LinkedText } from '@/components/mailbox/LinkedText';
import { useDevMail } from '@/lib/api/mail';
import { formatDateTime } from '@/lib/format';

/** One caught e-mail, as text, with its links clickable (an invitation link opens the accept screen). */
export function MessageScreen({ id }: { id: string }) {
  const mail = useDevMail();
  const message = mail.data?.find((m) => m.id === id);
  return (
    <Screen testID="message-screen">
      <View style={styles.back}>
        <Link href="/mailbox" asChild>
          <Button label="Mailbox" variant="ghost" size="compact" icon={<Icon name="back" size={20} color="primary" />} />
        </Link>
      </View>
      {mail.isPending ? <ActivityIndicator color={colors.primary} /> : null}
      {mail.data && !message ? (
        <Banner tone="warning" title="This message is gone">
          The local mail sink keeps messages only while the server runs; it may have restarted since.
        </Banner>
      ) : null}
      {message ? (
        <Card testID="mail-message">
          <Heading level={1} variant="heading">
            {message.subject || '(no subject)'}
          </Heading>
          <View style={styles.meta}>
            <Text variant="small" color="inkMuted">{`From ${message.from}`}</Text>
            <Text variant="small" color="inkMuted">{`To ${message.to.join(', ')}`}</Text>
            <Text variant="small" color="inkMuted">{formatDateTime(message.date)}</Text>
          </View>
          <View style={styles.body}>
            <LinkedText text={message.text} testID="mail-body" />
          </View>
        </Card>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  back: { flexDirection: 'row', marginLeft: -space.md },
  meta: { gap: 2 },
  body: { borderTopWidth: 1, borderTopColor: colors.line, paddingTop: space.md },
});
