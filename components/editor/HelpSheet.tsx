import { StyleSheet, View } from 'react-native';
import { Text, colors, space } from '@/components/ui';
import { Overlay } from '@/components/editor/Overlay';
import { SHORTCUTS } from '@/lib/editor/shortcuts';

const GESTURES: { wide: string; phone: string; does: string }[] = [
  { wide: 'Click', phone: 'Tap', does: 'Select a device, card, controller, port or cable' },
  { wide: 'Shift- or Ctrl-click', phone: '—', does: 'Add to or take from the selection' },
  { wide: 'Drag on empty canvas', phone: '—', does: 'Select the devices in a rectangle' },
  { wide: 'Click a port, then another', phone: 'Tap a port, then another', does: 'Cable them (on a wide screen choose media and length; on a phone the cable is made with the last media used, and a notice offers Undo and its settings)' },
  { wide: 'Connect to… in a port’s inspector', phone: 'Connect to… while cabling', does: 'Choose the other end from the free ports, the fitting ones first' },
  { wide: '—', phone: 'Tap a port drawn too small to aim at', does: 'List that device’s ports to choose from; zoom in (a tap on the device does) to tap ports directly' },
  { wide: 'Drag a device', phone: 'Drag a device', does: 'Move it (and the rest of the selection) on the grid' },
  { wide: 'Wheel, or middle-button drag', phone: 'Pinch, or drag empty canvas', does: 'Zoom about the pointer / pan' },
];

/** The shortcuts and gestures of the canvas. */
export function HelpSheet({ wide, onClose }: { wide: boolean; onClose: () => void }) {
  const isMac = typeof navigator !== 'undefined' && /Mac|iPhone|iPad/.test(navigator.platform ?? '');
  const mod = isMac ? '⌘' : 'Ctrl';
  return (
    <Overlay title="Canvas help" onClose={onClose} wide={wide} testID="help-sheet">
      <Text variant="bodyStrong">Pointer and touch</Text>
      {GESTURES.filter((g) => (wide ? g.wide : g.phone) !== '—').map((g) => (
        <View key={g.does} style={styles.row}>
          <Text variant="smallStrong" style={styles.keys}>
            {wide ? g.wide : g.phone}
          </Text>
          <Text variant="small" style={styles.does}>
            {g.does}
          </Text>
        </View>
      ))}
      {wide ? (
        <>
          <Text variant="bodyStrong">Keyboard</Text>
          {SHORTCUTS.map((s) => (
            <View key={s.action} style={styles.row} testID={`help-shortcut-${s.action}`}>
              <Text variant="smallStrong" style={styles.keys}>
                {s.keys.replace(/Mod/g, mod)}
              </Text>
              <Text variant="small" style={styles.does}>
                {s.does}
              </Text>
            </View>
          ))}
        </>
      ) : (
        <Text variant="small" color="inkMuted">
          Keyboard shortcuts are listed here on a wider screen with a keyboard.
        </Text>
      )}
      <Text variant="bodyStrong">On the canvas</Text>
      <Text variant="small">
        Cables: solid lines are twisted-pair copper (wider for a better category), long dashes multimode fibre, a heavy short-dashed line direct-attach copper, dash-dot active optical. A cable’s tag gives its fabric letter and medium (“A · 6A” is fabric A on Category 6A, “B · 6” fabric B on Category 6); the tag button beside the zoom shows the printed labels instead. A dashed, hatched outline with a warning triangle marks a single point of failure; a host’s badge counts its sessions, with a check when it has no single point of failure.
      </Text>
    </Overlay>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.md, paddingVertical: space.xs, borderBottomWidth: 1, borderBottomColor: colors.line },
  keys: { width: 170 },
  does: { flex: 1 },
});
