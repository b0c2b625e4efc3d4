import { StyleSheet, View } from 'react-native';
import { Banner, Text, space } from '@/components/ui';
import type { Issue } from '@/shared/api/common';

/**
 * Every problem of a document, each with the place it sits ("devices.3.ports.0.id"), so the file
 * can be fixed in one pass; the count comes first because a long list scrolls.
 */
export function IssueList({ title, issues, testID }: { title: string; issues: readonly Issue[]; testID?: string }) {
  return (
    <Banner tone="error" title={title} testID={testID}>
      <Text variant="small" color="dangerText">
        {issues.length === 1 ? '1 problem:' : `${issues.length} problems:`}
      </Text>
      <View style={styles.list} role="list">
        {issues.map((issue, i) => (
          <View key={`${issue.path}-${i}`} role="listitem" style={styles.item}>
            {issue.path ? (
              <Text variant="caption" color="dangerText" style={styles.path}>
                {issue.path}
              </Text>
            ) : null}
            <Text variant="small" color="dangerText">
              {issue.message}
            </Text>
          </View>
        ))}
      </View>
    </Banner>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  item: { gap: 2 },
  path: { fontFamily: 'monospace' },
});
