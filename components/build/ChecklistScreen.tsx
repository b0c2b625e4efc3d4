import { useCallback, useMemo, useState } from 'react';
import { FlatList, StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Badge, Banner, Button, Heading, SegmentedPicker, Text, colors, space, CONTENT_MAX_WIDTH } from '@/components/ui';
import { BuildProgressView } from '@/components/build/BuildProgressView';
import { QueueState } from '@/components/build/QueueState';
import { StepRow } from '@/components/build/StepRow';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { useChecklist, useShownBuild } from '@/lib/api/build';
import { useDesign } from '@/lib/api/designs';
import { cablesToDoHref, siteHomeHref } from '@/lib/build/links';
import { useMarking } from '@/lib/build/use-marking';
import { versionHref } from '@/lib/designs/links';
import { ownValue } from '@/shared/keys/record';
import type { Step, StepPhase } from '@/shared/build/steps';

export const PHASE_TITLES: Record<StepPhase, string> = {
  safety: 'Safety briefing',
  racks: 'Racks and power',
  switches: 'Switches on first',
  shelves: 'Expansion shelves',
  arrays: 'Arrays',
  hosts: 'Hosts',
  management: 'Management ports',
};

const PHASE_INTROS: Partial<Record<StepPhase, string>> = {
  safety:
    'Go through these with everyone on the job before work starts. They are general cautions: local codes, the equipment makers\u2019 instructions and licensed practice come first.',
  arrays: 'Power each array on after its shelves, and wait for its ready indication before going on.',
  hosts: 'For each host: initiator name, each data port\u2019s address, VLAN and MTU, portals discovered, sessions logged in and multipath checked.',
};

type Row = { kind: 'phase'; phase: StepPhase } | { kind: 'step'; step: Step; index: number };
type Filter = 'all' | 'open';

/**
 * The bring-up checklist of one approved version (shared/build/steps.ts): the safety briefing first,
 * then racks and power, switches, shelves, arrays, hosts and management, each step checkable with a
 * note. Long checklists (thousands of hosts) are drawn as a virtualised list.
 */
export function ChecklistScreen({ id, n }: { id: number; n: number }) {
  const design = useDesign(id);
  const checklist = useChecklist(id, n);
  const { shown, query } = useShownBuild(id, n);
  const marking = useMarking(id, n, shown);
  const [filter, setFilter] = useState<Filter>('all');

  const rows = useMemo<Row[]>(() => {
    const list: Row[] = [];
    let phase: StepPhase | null = null;
    (checklist.data ?? []).forEach((step, index) => {
      if (filter === 'open' && shown && ownValue(shown.steps, step.id)?.done) return;
      if (step.phase !== phase) {
        phase = step.phase;
        list.push({ kind: 'phase', phase });
      }
      list.push({ kind: 'step', step, index });
    });
    return list;
  }, [checklist.data, filter, shown]);

  const { markStep, canMark } = marking;
  const renderItem = useCallback(
    ({ item }: { item: Row }) =>
      item.kind === 'phase' ? (
        <View style={styles.phase} testID={`phase-${item.phase}`}>
          <Heading level={2}>{PHASE_TITLES[item.phase]}</Heading>
          {PHASE_INTROS[item.phase] ? <Text color="inkMuted">{PHASE_INTROS[item.phase]}</Text> : null}
        </View>
      ) : (
        <StepRow
          step={item.step}
          index={item.index}
          status={shown ? ownValue(shown.steps, item.step.id) : undefined}
          canMark={canMark}
          onMark={(done, note) => markStep({ stepId: item.step.id, done, ...(note ? { note } : {}) })}
        />
      ),
    [shown, canMark, markStep],
  );

  const name = design.data?.design.name ?? 'Design';
  const header = (
    <View style={styles.header}>
      <Link href={siteHomeHref} asChild>
        <Button label="Site work" variant="ghost" size="compact" testID="checklist-back" />
      </Link>
      <View style={styles.titleRow}>
        <Heading level={1}>{`${name}, version ${n}`}</Heading>
        {shown?.complete ? <Badge label="Build complete" tone="success" testID="checklist-complete" /> : null}
      </View>
      <Text color="inkMuted">Bring-up checklist: work from the top; each step can carry a note.</Text>
      <QueryStatus query={query} what="The build record" testID="checklist-record-error" />
      <QueryStatus query={checklist} what="The checklist" testID="checklist-error" />
      {shown?.supersededBy ? (
        <Banner tone="warning" title={`Version ${shown.supersededBy.number} is approved now`} testID="checklist-superseded">
          This version is no longer the one to build from. Open the newer version's checklist from Site work.
        </Banner>
      ) : null}
      {marking.why ? (
        <Banner tone="info" testID="checklist-read-only">
          {marking.why}
        </Banner>
      ) : null}
      <QueueState designId={id} version={n} />
      {shown ? <BuildProgressView progress={shown.progress} testID="checklist-progress" /> : null}
      <View style={styles.links}>
        <Link href={cablesToDoHref(id, n)} asChild>
          <Button label="Cables to do" variant="secondary" fullWidth testID="checklist-cables" />
        </Link>
        <Link href={versionHref(id, n)} asChild>
          <Button label="The design, read-only" variant="ghost" fullWidth testID="checklist-version" />
        </Link>
      </View>
      {checklist.data ? (
        <SegmentedPicker<Filter>
          label="Show"
          options={[
            { value: 'all', label: 'Every step' },
            { value: 'open', label: 'Not done yet' },
          ]}
          value={filter}
          onChange={setFilter}
          testID="checklist-filter"
        />
      ) : null}
    </View>
  );

  return (
    <FlatList
      testID="checklist-screen"
      style={styles.list}
      contentContainerStyle={styles.content}
      data={rows}
      keyExtractor={(row) => (row.kind === 'phase' ? `phase:${row.phase}` : `step:${row.index}`)}
      renderItem={renderItem}
      ListHeaderComponent={header}
      ListEmptyComponent={checklist.data && filter === 'open' ? <Text testID="checklist-all-done">Every step is done.</Text> : null}
      ItemSeparatorComponent={Separator}
      initialNumToRender={12}
      windowSize={7}
      keyboardShouldPersistTaps="handled"
    />
  );
}

function Separator() {
  return <View style={styles.separator} />;
}

const styles = StyleSheet.create({
  list: { flex: 1, backgroundColor: colors.paper },
  content: { paddingHorizontal: space.lg, paddingTop: space.lg, paddingBottom: space.xxxl, width: '100%', maxWidth: CONTENT_MAX_WIDTH, alignSelf: 'center' },
  header: { gap: space.md, marginBottom: space.lg },
  titleRow: { flexDirection: 'row', alignItems: 'center', gap: space.sm, flexWrap: 'wrap' },
  links: { gap: space.sm },
  phase: { gap: space.xs, paddingTop: space.lg },
  separator: { height: space.md },
});
