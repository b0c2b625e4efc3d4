import { View, StyleSheet } from 'react-native';
import { Button, EmptyState, Screen, Text, space } from '@/components/ui';
import { QueueState } from '@/components/build/QueueState';
import { SiteVersionCard } from '@/components/build/SiteVersionCard';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { useDesigns } from '@/lib/api/designs';
import { useTeam } from '@/lib/api/team';
import type { DesignListItem } from '@/shared/api/designs';

type Approved = DesignListItem & { approvedVersion: NonNullable<DesignListItem['approvedVersion']> };

/** The installer's home: the team's approved versions to build, each with its progress, newest work first. */
export function SiteHomeScreen() {
  const designs = useDesigns();
  const team = useTeam();
  const teamName = team.data?.team.name ?? 'your team';
  const approved = (designs.data?.designs ?? []).filter((d): d is Approved => d.approvedVersion !== null);
  return (
    <Screen title="Site work" intro={`Approved designs of ${teamName} to build. Marks made without signal are kept on this phone and sent later.`} testID="site-home">
      <QueueState />
      <QueryStatus query={designs} what="Designs" testID="site-home-error" />
      {designs.data && approved.length === 0 && !designs.hasNextPage ? (
        <EmptyState icon="site" title="Nothing to build yet" testID="site-home-empty">
          A design appears here once a version of it is approved.
        </EmptyState>
      ) : null}
      <View style={styles.list}>
        {approved.map((design, index) => (
          <SiteVersionCard key={design.id} design={design} index={index} />
        ))}
      </View>
      {designs.hasNextPage ? (
        <>
          <Text variant="small" color="inkMuted">
            Older designs are on the next page.
          </Text>
          <Button
            label="Show more designs"
            variant="secondary"
            fullWidth
            loading={designs.isFetchingNextPage}
            loadingLabel="Loading more designs"
            onPress={() => void designs.fetchNextPage()}
            testID="site-home-more"
          />
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({ list: { gap: space.lg } });
