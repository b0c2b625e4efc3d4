import { useEffect, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { useStore } from 'zustand';
import { Banner, Button, Text, TextField, space } from '@/components/ui';
import type { Media } from '@/shared/topology/schema';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { suggestMedia } from '@/lib/editor/commands';
import { cablesOnPort, describeId, portLabel } from '@/lib/editor/describe';
import { MEDIA_LABELS } from '@/lib/editor/drawing';
import { lengthField, parseField } from '@/lib/editor/fields';
import { useCableDefaults, useEditorDoc } from '@/lib/editor/hooks';
import { editorStore } from '@/lib/editor/store';
import { ChipPicker } from '@/components/inspector/ChipPicker';
import { MEDIA_CHIPS } from '@/components/inspector/CableInspector';
import { Overlay } from '@/components/editor/Overlay';

/**
 * The small chooser after the second port is tapped: media and length, starting from what was
 * used last for this connector, with the model's suggestion for these two ports named beside it.
 * Enter cables them; Escape or Cancel leaves the first port chosen.
 */
export function CableChooser({ wide }: { wide: boolean }) {
  const chooser = useStore(canvasUiStore, (s) => s.chooser);
  if (!chooser) return null;
  return <ChooserBody key={`${chooser.a}>${chooser.b}`} a={chooser.a} b={chooser.b} wide={wide} />;
}

function ChooserBody({ a, b, wide }: { a: string; b: string; wide: boolean }) {
  const doc = useEditorDoc();
  const defaults = useCableDefaults();
  const start = describeId(doc, a);
  const end = describeId(doc, b);
  const startPort = start?.kind === 'port' ? start.port : null;
  const endPort = end?.kind === 'port' ? end.port : null;
  const remembered = startPort ? defaults[startPort.connector] : defaults.rj45;
  const [media, setMedia] = useState<Media>(remembered.media);
  const [length, setLength] = useState(remembered.lengthM === undefined ? '' : String(remembered.lengthM));
  const [replace, setReplace] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const parsedLength = parseField(lengthField, length);
  const suggestion = startPort && endPort ? suggestMedia(startPort, endPort, parsedLength.ok ? (parsedLength.value ?? undefined) : undefined) : null;
  const busy = [...cablesOnPort(doc, a), ...cablesOnPort(doc, b)];
  const close = () => canvasUiStore.setState({ chooser: null });

  const confirm = () => {
    if (!parsedLength.ok) return setError(parsedLength.message);
    const result = editorStore.getState().finishCable(b, { media, lengthM: parsedLength.value ?? undefined, replace });
    if (!result.ok) return setError(result.error.message);
    close();
    canvasUiStore.setState({ pointer: null });
  };

  useEffect(() => {
    if (typeof window === 'undefined' || typeof window.addEventListener !== 'function') return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Enter') {
        e.preventDefault();
        confirm();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  });

  return (
    <Overlay title="Cable these ports" onClose={close} wide={wide} maxWidth={480} testID="cable-chooser">
      <Text variant="bodyStrong" testID="cable-chooser-ends">{`${portLabel(doc, a)} → ${portLabel(doc, b)}`}</Text>
      {startPort && endPort && startPort.connector !== endPort.connector ? <Banner tone="warning">One end is RJ45 and the other SFP: this cable cannot plug into both (the analysis reports it).</Banner> : null}
      <ChipPicker<Media> label="Media" chips={MEDIA_CHIPS} value={media} onChange={setMedia} testID="cable-chooser-media" hint={suggestion ? `Suggested for these ports: ${MEDIA_LABELS[suggestion]}.` : undefined} />
      <TextField label="Length (m)" value={length} onChangeText={setLength} keyboardType="decimal-pad" error={parsedLength.ok ? null : parsedLength.message} testID="cable-chooser-length" hint="Leave empty if not measured yet." />
      {busy.length > 0 ? (
        <ChipPicker
          label={`A port already has ${busy.map((c) => c.label ?? c.id).join(' and ')}`}
          chips={[
            { value: 'keep', label: 'Keep it (port cabled twice)' },
            { value: 'replace', label: 'Replace it' },
          ]}
          value={replace ? 'replace' : 'keep'}
          onChange={(v) => setReplace(v === 'replace')}
          testID="cable-chooser-replace"
        />
      ) : null}
      {error ? <Banner tone="error">{error}</Banner> : null}
      <View style={styles.actions}>
        <Button label="Cable them" onPress={confirm} testID="cable-chooser-confirm" />
        <Button label="Cancel" variant="ghost" onPress={close} testID="cable-chooser-cancel" />
      </View>
    </Overlay>
  );
}

const styles = StyleSheet.create({ actions: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' } });
