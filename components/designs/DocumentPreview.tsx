import { useMemo } from 'react';
import { StyleSheet, View } from 'react-native';
import { Text, colors, radius, space } from '@/components/ui';
import { SummaryLine } from '@/components/designs/SummaryLine';
import { documentFacts } from '@/lib/designs/preview';
import type { Topology } from '@/shared/topology/schema';

/** A document's contents and its analysis summary, before it is saved. */
export function DocumentPreview({ doc, title, testID }: { doc: Topology; title: string; testID?: string }) {
  const facts = useMemo(() => documentFacts(doc), [doc]);
  return (
    <View style={styles.box} testID={testID}>
      <Text variant="smallStrong">{title}</Text>
      <Text variant="small">{facts.contents}</Text>
      <SummaryLine summary={facts.summary} testID={testID ? `${testID}-summary` : undefined} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.xs, padding: space.md, borderRadius: radius.md, backgroundColor: colors.surfaceSunken },
});
