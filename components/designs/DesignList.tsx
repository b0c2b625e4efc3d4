import { StyleSheet, View } from 'react-native';
import { Icon, Text, colors, radius, space } from '@/components/ui';
import { LinkRow } from '@/components/designs/LinkRow';
import { DesignStatus } from '@/components/designs/DesignStatus';
import { SummaryLine } from '@/components/designs/SummaryLine';
import { designHref } from '@/lib/designs/links';
import { formatDateTime } from '@/lib/format';
import type { DesignListItem } from '@/shared/api/designs';

/** Phone layout: one tappable card per design, status on top so it is read first. */
export function DesignList({ designs }: { designs: readonly DesignListItem[] }) {
  return (
    <View style={styles.list} role="list" testID="designs-list">
      {designs.map((design) => (
        <View role="listitem" key={design.id}>
          <LinkRow href={designHref(design.id)} testID={`design-${design.id}`} style={styles.card} pressedStyle={styles.pressed}>
              <View style={styles.head}>
                <View style={styles.title}>
                  <Text variant="bodyStrong">{design.name}</Text>
                  {design.site ? (
                    <Text variant="small" color="inkMuted">
                      {design.site}
                    </Text>
                  ) : null}
                </View>
                <Icon name="chevron" size={20} color="inkMuted" />
              </View>
              <DesignStatus status={design.status} approvedVersion={design.approvedVersion} latest={design.latestVersion} testID={`design-${design.id}-status`} />
              <LatestLine design={design} />
          </LinkRow>
        </View>
      ))}
    </View>
  );
}

export function LatestLine({ design }: { design: DesignListItem }) {
  const latest = design.latestVersion;
  if (!latest) {
    return (
      <Text variant="small" color="inkMuted" testID={`design-${design.id}-latest`}>
        No versions yet
      </Text>
    );
  }
  return (
    <View style={styles.latest} testID={`design-${design.id}-latest`}>
      <Text variant="small">{`Version ${latest.number} · ${formatDateTime(latest.createdAt)}`}</Text>
      <SummaryLine summary={latest.summary} />
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.md },
  card: { backgroundColor: colors.surface, borderRadius: radius.lg, borderWidth: 1, borderColor: colors.line, padding: space.lg, gap: space.sm },
  pressed: { backgroundColor: colors.surfaceSunken },
  head: { flexDirection: 'row', alignItems: 'flex-start', gap: space.sm },
  title: { flex: 1, gap: 2 },
  latest: { gap: 2 },
});
