import { StyleSheet, View } from 'react-native';
import { Link } from 'expo-router';
import { Banner, Button, Card, Heading, Icon, Screen, SegmentedPicker, Text, space } from '@/components/ui';
import { QueryStatus } from '@/components/designs/QueryStatus';
import { DiffSectionView } from '@/components/versions/DiffSectionView';
import { useDesign } from '@/lib/api/designs';
import { useVersionDiff } from '@/lib/api/versions';
import { changeText, diffHeadline, SECTION_ORDER } from '@/lib/designs/diff-words';
import { designHref } from '@/lib/designs/links';

type DiffScreenProps = { id: number; from: number | null; to: number | null; onPick: (from: number, to: number) => void };

/** What changed from one version to another, section by section. */
export function DiffScreen({ id, from, to, onPick }: DiffScreenProps) {
  const design = useDesign(id);
  const numbers = (design.data?.versions ?? []).map((v) => v.number).sort((a, b) => a - b);
  // Without a choice in the address, compare the latest version with the one before it.
  const right = to ?? numbers[numbers.length - 1] ?? null;
  const left = from ?? numbers[numbers.length - 2] ?? null;
  const ready = left !== null && right !== null && left !== right;
  const diff = useVersionDiff(id, left ?? 0, right ?? 0, { enabled: ready });
  const options = numbers.map((n) => ({ value: String(n), label: `Version ${n}` }));
  const name = design.data?.design.name ?? 'the design';

  return (
    <Screen testID="diff-screen" maxWidth={1100}>
      <Link href={designHref(id)} asChild>
        <Button label={`Back to ${name}`} variant="ghost" size="compact" icon={<Icon name="back" size={18} color="primary" />} />
      </Link>
      <Heading level={1}>{ready ? `Version ${left} → version ${right}` : 'Compare versions'}</Heading>
      <QueryStatus query={design} what="The design" />
      {numbers.length > 1 ? (
        <Card>
          <SegmentedPicker label="From" options={options} value={left === null ? null : String(left)} onChange={(v) => onPick(Number(v), right ?? Number(v))} testID="diff-from" />
          <SegmentedPicker label="To" options={options} value={right === null ? null : String(right)} onChange={(v) => onPick(left ?? Number(v), Number(v))} testID="diff-to" />
        </Card>
      ) : null}
      {design.data && numbers.length < 2 ? <Banner tone="info">This design has only one version, so there is nothing to compare yet.</Banner> : null}
      {left !== null && left === right ? <Banner tone="info">Pick two different versions.</Banner> : null}
      {ready ? <QueryStatus query={diff} what="The comparison" testID="diff-error" /> : null}
      {ready && diff.data ? (
        <>
          <Text variant="bodyStrong" testID="diff-headline">
            {diffHeadline(diff.data)}
          </Text>
          {diff.data.document.length > 0 ? (
            <Card testID="diff-document">
              <Heading level={2}>Design settings</Heading>
              {diff.data.document.map((change) => (
                <Text key={change.field} variant="small">
                  {changeText(change, 'changed')}
                </Text>
              ))}
            </Card>
          ) : null}
          <View style={styles.sections}>
            {SECTION_ORDER.map((section) => (
              <DiffSectionView key={section} name={section} section={diff.data[section]} />
            ))}
          </View>
        </>
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  sections: { gap: space.lg },
});
