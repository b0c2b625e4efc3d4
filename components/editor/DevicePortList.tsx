import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Banner, Button, Text, space } from '@/components/ui';
import { canvasUiStore } from '@/lib/editor/canvas-ui';
import { devicePorts } from '@/lib/editor/connect';
import { portLabel } from '@/lib/editor/describe';
import { useEditorDoc, usePendingCableStart, useReadOnly } from '@/lib/editor/hooks';
import { cableNow } from '@/lib/editor/quick-cable';
import { editorStore } from '@/lib/editor/store';
import { PortRow } from '@/components/editor/PortRow';

/**
 * The ports of one device, offered when they are drawn too small to tap. While a cable is being
 * drawn from another device, a free port here ends it; otherwise a port is selected and a cable
 * starts from it, as a tap on the port itself would.
 */
export function DevicePortList({ deviceId }: { deviceId: string }) {
  const doc = useEditorDoc();
  const pending = usePendingCableStart();
  const readOnly = useReadOnly();
  const [error, setError] = useState<string | null>(null);
  const own = useMemo(() => devicePorts(doc, deviceId), [doc, deviceId]);
  // A cable begun on another device ends here; one begun on this device is not finished on it.
  const finishing = pending !== null && !own.some((p) => p.portId === pending);
  const ports = useMemo(() => (finishing ? devicePorts(doc, deviceId, pending) : own), [doc, deviceId, finishing, pending, own]);

  const choose = (portId: string) => {
    if (finishing && !readOnly) return setError(cableNow(portId));
    const state = editorStore.getState();
    state.select([portId]);
    if (!readOnly) state.startCable(portId);
    canvasUiStore.setState({ portList: null });
  };

  return (
    <View style={styles.wrap} testID="port-list">
      <Text variant="small" color="inkMuted">
        {finishing ? `Choose where the cable from ${portLabel(doc, pending!)} ends.` : 'The ports are small at this zoom: choose one here.'}
      </Text>
      {error ? <Banner tone="error">{error}</Banner> : null}
      {ports.map((p) => (
        <PortRow
          key={p.portId}
          label={p.label}
          network={p.network}
          notes={finishing && !p.cabledTo ? (p.choice?.notes ?? []) : null}
          cabledTo={p.cabledTo}
          disabled={finishing && p.cabledTo !== null}
          onPress={() => choose(p.portId)}
          testID={`port-list-${p.portId}`}
        />
      ))}
      <Button
        label="Device settings"
        variant="ghost"
        size="compact"
        onPress={() => {
          editorStore.getState().cancelCable();
          editorStore.getState().select([deviceId]);
          canvasUiStore.setState({ portList: null });
        }}
        testID="port-list-device"
      />
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: space.sm } });
