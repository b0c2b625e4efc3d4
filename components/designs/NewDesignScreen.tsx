import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Link, useRouter } from 'expo-router';
import { Banner, Button, Card, Heading, Screen, SegmentedPicker, Text, TextField, space } from '@/components/ui';
import { ImportField } from '@/components/designs/ImportField';
import { IssueList } from '@/components/designs/IssueList';
import { PatternFields } from '@/components/designs/PatternFields';
import { isApiRequestError } from '@/lib/api/client';
import { useCreateDesign } from '@/lib/api/designs';
import { designHref } from '@/lib/designs/links';
import { buildCreateBody, DEFAULT_PATTERN_VALUES, type NewDesignValues, type StartKind } from '@/lib/designs/new-design';
import { describeFailure, type FieldErrors } from '@/lib/forms';
import type { ImportResult } from '@/lib/import';

const START_OPTIONS: { value: StartKind; label: string }[] = [
  { value: 'pattern', label: 'From a pattern' },
  { value: 'import', label: 'From a file' },
  { value: 'blank', label: 'Blank' },
];

const START_HINTS: Record<StartKind, string> = {
  pattern: 'A complete starting design with addresses and cables; its analysis is shown below before you create it.',
  import: 'A topology JSON file, for example one downloaded from another design. It is checked here before it is sent.',
  blank: 'A design with no versions yet; its first version is drawn on the canvas or uploaded from a file.',
};

/** Start a design; whatever goes wrong, the form keeps every value typed and picked. */
export function NewDesignScreen({ pickFile }: { pickFile?: () => Promise<ImportResult | null> }) {
  const router = useRouter();
  const create = useCreateDesign();
  const [values, setValues] = useState<NewDesignValues>({ name: '', site: '', message: '', start: 'pattern', pattern: DEFAULT_PATTERN_VALUES, imported: null });
  const [errors, setErrors] = useState<FieldErrors>({});
  const failure = describeFailure(create.error);
  const documentIssues = isApiRequestError(create.error) ? create.error.issues.filter((i) => i.path.startsWith('document')) : [];
  const shown = { ...failure.fields, ...errors };
  const set = <K extends keyof NewDesignValues>(key: K, value: NewDesignValues[K]) => setValues((v) => ({ ...v, [key]: value }));

  function submit() {
    const built = buildCreateBody(values);
    setErrors(built.errors ?? {});
    if (!built.body) return;
    create.mutate(built.body, { onSuccess: ({ design }) => router.replace(designHref(design.id)) });
  }

  return (
    <Screen title="New design" intro="Name the design, then choose how it starts." testID="new-design-screen">
      <Card>
        <TextField label="Name" value={values.name} onChangeText={(t) => set('name', t)} error={shown.name} testID="new-design-name" />
        <TextField label="Site" hint="Optional: the room or building it is for" value={values.site} onChangeText={(t) => set('site', t)} error={shown.site} testID="new-design-site" />
      </Card>
      <Card>
        <Heading level={2}>Start</Heading>
        <SegmentedPicker label="Start from" options={START_OPTIONS} value={values.start} onChange={(start) => set('start', start)} testID="new-design-start" />
        <Text variant="small" color="inkMuted">
          {START_HINTS[values.start]}
        </Text>
        {values.start === 'pattern' ? <PatternFields values={values.pattern} onChange={(p) => set('pattern', p)} name={values.name} errors={shown} /> : null}
        {values.start === 'import' ? (
          <ImportField
            label="Choose a topology file"
            testID="new-design-file"
            error={shown.file}
            pick={pickFile}
            onDocument={(doc) => setValues((v) => ({ ...v, imported: doc, name: v.name || doc?.name || '' }))}
          />
        ) : null}
        {values.start !== 'blank' ? (
          <TextField label="What version 1 holds" hint="Optional; “First version” when left empty" value={values.message} onChangeText={(t) => set('message', t)} error={shown.message} testID="new-design-message" />
        ) : null}
      </Card>
      {documentIssues.length > 0 ? <IssueList title="The server refused the document" issues={documentIssues} testID="new-design-server-issues" /> : null}
      {failure.form ? (
        <Banner tone="error" title="The design was not created" testID="new-design-error">
          {failure.form}
        </Banner>
      ) : null}
      <View style={styles.actions}>
        <Button label="Create design" loading={create.isPending} loadingLabel="Creating…" onPress={submit} testID="new-design-submit" />
        <Link href="/designs" asChild>
          <Button label="Cancel" variant="ghost" />
        </Link>
      </View>
    </Screen>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', gap: space.md, flexWrap: 'wrap' },
});
