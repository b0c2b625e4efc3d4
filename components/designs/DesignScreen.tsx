import { useState } from 'react';
import { StyleSheet, useWindowDimensions, View } from 'react-native';
import { Link } from 'expo-router';
import { Button, Card, EmptyState, Screen, WIDE_BREAKPOINT, space } from '@/components/ui';
import { editorHref } from '@/lib/designs/links';
import { DesignHeader } from '@/components/designs/DesignHeader';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { UploadVersion } from '@/components/versions/UploadVersion';
import { VersionList } from '@/components/versions/VersionList';
import { VersionPanel } from '@/components/versions/VersionPanel';
import { DesignBuildProgress } from '@/components/build/DesignBuildProgress';
import { useMe } from '@/lib/api/auth';
import { useDesign } from '@/lib/api/designs';
import { can } from '@/shared/roles';

type DesignScreenProps = { id: number; selected: number | null; onSelect: (n: number) => void };

/** One design: its versions and the selected one's details and review; master-detail when wide. */
export function DesignScreen({ id, selected, onSelect }: DesignScreenProps) {
  const me = useMe();
  const design = useDesign(id);
  const [uploading, setUploading] = useState(false);
  const { width } = useWindowDimensions();
  const wide = width >= WIDE_BREAKPOINT;
  const viewer = me.data ? { id: me.data.id, role: me.data.role } : null;
  const versions = design.data?.versions ?? [];
  const latest = versions[0]?.number ?? null;
  const shown = versions.find((v) => v.number === selected) ?? versions[0] ?? null;
  const editor = viewer ? can(viewer.role, 'editDesigns') : false;

  if (!design.data || !viewer) {
    return (
      <Screen title="Design" testID="design-screen">
        <QueryStatus query={design} what="The design" testID="design-error" />
      </Screen>
    );
  }
  const { design: info } = design.data;
  const panel = (version: NonNullable<typeof shown>) => (
    <VersionPanel designId={id} designName={info.name} version={version} latestNumber={latest ?? version.number} viewer={viewer} onSelect={onSelect} embedded={!wide} />
  );
  const list = (
    <VersionList designId={id} versions={versions} selected={shown?.number ?? null} onSelect={onSelect} renderSelected={wide ? undefined : panel} />
  );

  return (
    <Screen testID="design-screen" maxWidth={wide ? 1280 : undefined}>
      <DesignHeader design={info} latest={versions[0] ?? null} editor={editor} uploading={uploading} onUpload={() => setUploading(true)} />
      {info.approvedVersion ? <DesignBuildProgress designId={id} version={info.approvedVersion.number} /> : null}
      {uploading ? (
        <UploadVersion
          designId={id}
          latestNumber={latest}
          onClose={() => setUploading(false)}
          onSaved={(n) => {
            setUploading(false);
            onSelect(n);
          }}
        />
      ) : null}
      {versions.length === 0 ? (
        <EmptyState icon="designs" title="No versions yet" testID="design-no-versions" action={editor ? <BlankDesignActions id={id} onUpload={() => setUploading(true)} /> : null}>
          {editor
            ? 'Draw this design on the canvas and save it as version 1, or upload a topology file instead.'
            : 'This design has no saved version yet; the designers are still drawing it.'}
        </EmptyState>
      ) : wide ? (
        <View style={styles.split}>
          <View style={styles.master}>{list}</View>
          <Card style={styles.detail}>{shown ? panel(shown) : null}</Card>
        </View>
      ) : (
        list
      )}
    </Screen>
  );
}

/** A blank design's next steps: the editor first, a file second. */
function BlankDesignActions({ id, onUpload }: { id: number; onUpload: () => void }) {
  return (
    <View style={styles.blankActions}>
      <Link href={editorHref(id)} asChild>
        <Button label="Open in editor" testID="design-no-versions-edit" />
      </Link>
      <Button label="Upload a file" variant="ghost" onPress={onUpload} testID="design-no-versions-upload" />
    </View>
  );
}

const styles = StyleSheet.create({
  blankActions: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm, justifyContent: 'center' },
  split: { flexDirection: 'row', gap: space.xl, alignItems: 'flex-start' },
  master: { flex: 2, minWidth: 0 },
  detail: { flex: 3, minWidth: 0 },
});
