import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Badge, Button, Card, Heading, Text, space } from '@/components/ui';
import { ProgressBar } from '@/components/build/ProgressBar';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { useShownBuild } from '@/lib/api/build';
import { cablesToDoHref, checklistHref } from '@/lib/build/links';
import { plural, stateSummary } from '@/lib/build/words';
import { formatDate } from '@/lib/format';
import type { DesignListItem } from '@/shared/api/designs';

type SiteVersionCardProps = { design: DesignListItem & { approvedVersion: NonNullable<DesignListItem['approvedVersion']> }; index: number };

/**
 * One approved version to build on the installer's home: what and where, its progress (with this
 * phone's queued marks counted), and one big tap into its checklist at the bottom of the card,
 * where a thumb reaches.
 */
export function SiteVersionCard({ design, index }: SiteVersionCardProps) {
  const n = design.approvedVersion.number;
  const { shown, query } = useShownBuild(design.id, n);
  const summary = shown ? stateSummary(shown.progress.states) : '';
  return (
    <Card testID={`site-version-${index}`}>
      <View style={styles.head}>
        <Heading level={2}>{design.name}</Heading>
        {shown?.complete ? <Badge label="Complete" tone="success" testID={`site-version-${index}-complete`} /> : null}
      </View>
      <Text color="inkMuted">{[design.site, `version ${n}, approved ${formatDate(design.approvedVersion.approvedAt)}`].filter(Boolean).join(' · ')}</Text>
      <QueryStatus query={query} what="The build record" />
      {shown ? (
        <View style={styles.progress}>
          <ProgressBar label="Cables" count={shown.progress.cables} doneWord="tested" testID={`site-version-${index}-cables`} />
          <ProgressBar label="Bring-up steps" count={shown.progress.steps} doneWord="done" testID={`site-version-${index}-steps`} />
          {summary ? <Text variant="small">{summary}</Text> : null}
          {shown.waiting > 0 ? (
            <Badge label={`${plural(shown.waiting, 'mark')} waiting to send`} tone="warning" testID={`site-version-${index}-waiting`} />
          ) : null}
        </View>
      ) : null}
      <View style={styles.actions}>
        <Link href={checklistHref(design.id, n)} asChild>
          <Button label="Open checklist" fullWidth testID={`site-version-${index}-open`} />
        </Link>
        <Link href={cablesToDoHref(design.id, n)} asChild>
          <Button label="Cables to do" variant="secondary" fullWidth testID={`site-version-${index}-cables-open`} />
        </Link>
      </View>
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', alignItems: 'center', justifyContent: 'space-between', gap: space.sm, flexWrap: 'wrap' },
  progress: { gap: space.md },
  actions: { gap: space.sm },
});
