import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Button, Heading, Icon, Text, space } from '@/components/ui';
import { DesignStatus } from '@/components/designs/DesignStatus';
import { editorHref } from '@/lib/designs/links';
import type { DesignDto, VersionSummary } from '@/shared/api/designs';

type DesignHeaderProps = { design: DesignDto; latest: VersionSummary | null; editor: boolean; uploading: boolean; onUpload: () => void };

/** The design's name, site and status, with the actions that apply to the design as a whole. */
export function DesignHeader({ design, latest, editor, uploading, onUpload }: DesignHeaderProps) {
  return (
    <View style={styles.wrap}>
      <Link href="/designs" asChild>
        <Button label="All designs" variant="ghost" size="compact" icon={<Icon name="back" size={18} color="primary" />} testID="design-back" />
      </Link>
      <View style={styles.title}>
        <Heading level={1}>{design.name}</Heading>
        <DesignStatus status={design.status} approvedVersion={design.approvedVersion} latest={latest && { number: latest.number, review: latest.review.state }} testID="design-status" />
      </View>
      {design.site ? <Text color="inkMuted">{design.site}</Text> : null}
      {latest ? (
        // A blank design offers its editor in the empty state below instead, first of its two ways to start.
        <View style={styles.actions}>
          {editor ? (
            <Link href={editorHref(design.id)} asChild>
              <Button label="Open in editor" testID="design-edit" />
            </Link>
          ) : (
            // Roles that may not edit see the newest version they may read on the canvas, read-only.
            <Link href={editorHref(design.id)} asChild>
              <Button label="View on canvas" variant="secondary" testID="design-view-canvas" />
            </Link>
          )}
          {editor && !uploading ? (
            <Button label="Upload a document as a new version" variant="secondary" icon={<Icon name="upload" size={18} color="primary" />} onPress={onUpload} testID="design-upload" />
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  title: { flexDirection: 'row', alignItems: 'center', gap: space.md, flexWrap: 'wrap' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, marginTop: space.sm },
});
