import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner, Button, Card, Heading, Text, colors, space } from '@/components/ui';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { useMe } from '@/lib/api/auth';
import { useGenerateSecrets, useRevealSecrets, useSecretsStatus } from '@/lib/api/secrets';
import type { RevealedSecret, SecretsStatus } from '@/shared/api/secrets';
import { can } from '@/shared/roles';

/**
 * The design's CHAP secrets on the report screen. Everyone on the team sees whether they exist and
 * who was shown them; admins and designers make (or remake) them; admins and installers show one
 * host's secrets at a time, after a warning, and each showing is recorded by the server.
 */
export function SecretsCard({ id }: { id: number }) {
  const me = useMe();
  const status = useSecretsStatus(id);
  const role = me.data?.role;
  const mayMake = role ? can(role, 'generateSecrets') : false;
  const mayReveal = role ? can(role, 'revealSecrets') : false;
  if (status.data?.mode === 'none' && status.data.hosts.length === 0) return null;
  return (
    <Card testID="report-secrets">
      <Heading level={2}>CHAP secrets</Heading>
      <QueryStatus query={status} what="The CHAP secrets" testID="report-secrets-error" />
      {status.data ? <SecretsBody id={id} status={status.data} mayMake={mayMake} mayReveal={mayReveal} /> : null}
    </Card>
  );
}

function SecretsBody({ id, status, mayMake, mayReveal }: { id: number; status: SecretsStatus; mayMake: boolean; mayReveal: boolean }) {
  const generate = useGenerateSecrets(id);
  const made = status.generatedAt !== null;
  return (
    <View style={styles.stack}>
      <Text variant="small" testID="report-secrets-state">
        {made
          ? `Made ${new Date(status.generatedAt!).toLocaleString()} by ${status.generatedBy?.name ?? 'someone'}: ${status.length} characters, for ${status.hosts.length} hosts${status.mode === 'mutual' ? ', each with a second secret for the target (mutual CHAP)' : ''}.`
          : `CHAP is ${status.mode} in the latest version and no secrets are made yet.`}
      </Text>
      {generate.data ? (
        <Banner tone={made ? 'warning' : 'success'} testID="report-secrets-notice">
          {generate.data.notice}
        </Banner>
      ) : null}
      {generate.error ? (
        <Banner tone="error" testID="report-secrets-generate-error">
          {generate.error.message}
        </Banner>
      ) : null}
      {mayMake && status.mode !== 'none' ? (
        <Button
          label={made ? 'Make new secrets' : 'Make secrets'}
          variant="secondary"
          size="compact"
          disabled={generate.isPending}
          onPress={() => generate.mutate({})}
          testID="report-secrets-generate"
        />
      ) : null}
      {made && mayReveal ? <RevealList id={id} status={status} /> : null}
      {made && !mayReveal ? <Text variant="small" color="inkMuted">Only admins and installers are shown the secrets.</Text> : null}
      {status.reveals.length > 0 ? (
        <View style={styles.stack} testID="report-secrets-reveals">
          <Text variant="smallStrong">Shown to</Text>
          {status.reveals.slice(0, 10).map((r, i) => (
            <Text key={i} variant="caption" color="inkMuted">{`${r.by.name}, ${new Date(r.at).toLocaleString()}${r.host ? ` (${r.host})` : ' (all hosts)'}`}</Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

function RevealList({ id, status }: { id: number; status: SecretsStatus }) {
  const reveal = useRevealSecrets(id);
  const [asked, setAsked] = useState<string | null>(null);
  const [shown, setShown] = useState<{ host: string; secrets: RevealedSecret[] } | null>(null);
  return (
    <View style={styles.stack}>
      {status.hosts.map((host) => (
        <View key={host.host} style={styles.host} testID={`secrets-host-${host.host}`}>
          <Text variant="bodyStrong">{host.name}</Text>
          {shown?.host === host.host ? (
            <View style={styles.stack}>
              {shown.secrets.map((s) => (
                <Text key={s.direction} variant="body" selectable testID={`secrets-host-${host.host}-${s.direction}`}>
                  {`${s.direction === 'initiator' ? 'Initiator (host → target)' : 'Target (target → host, mutual)'}: ${s.secret}`}
                </Text>
              ))}
              <Button label="Hide" variant="ghost" size="compact" onPress={() => setShown(null)} testID={`secrets-host-${host.host}-hide`} />
            </View>
          ) : asked === host.host ? (
            <View style={styles.stack}>
              <Banner tone="warning" title="Showing secrets is recorded" testID={`secrets-host-${host.host}-warning`}>
                Your name and the time are kept. Make sure nobody can read your screen, and never paste a secret into e-mail, chat or a ticket.
              </Banner>
              <View style={styles.row}>
                <Button
                  label="Show now"
                  size="compact"
                  disabled={reveal.isPending}
                  testID={`secrets-host-${host.host}-confirm`}
                  onPress={() =>
                    reveal.mutate(host.host, {
                      onSuccess: (data) => {
                        setShown({ host: host.host, secrets: data.secrets });
                        setAsked(null);
                      },
                    })
                  }
                />
                <Button label="Cancel" variant="ghost" size="compact" onPress={() => setAsked(null)} />
              </View>
            </View>
          ) : (
            <Button label="Show secrets" variant="secondary" size="compact" onPress={() => setAsked(host.host)} testID={`secrets-host-${host.host}-show`} />
          )}
        </View>
      ))}
      {reveal.error ? (
        <Banner tone="error" testID="report-secrets-reveal-error">
          {reveal.error.message}
        </Banner>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  stack: { gap: space.sm },
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  host: { gap: space.xs, paddingTop: space.sm, borderTopWidth: 1, borderTopColor: colors.line },
});
