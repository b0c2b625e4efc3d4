import { Pressable, StyleSheet, View } from 'react-native';
import { Icon, Text, colors, radius, space, TAP_TARGET } from '@/components/ui';

type PortRowProps = {
  label: string;
  network: string | null;
  /** Why the cable would not be right; empty means it fits. Null when no cable is being drawn. */
  notes: string[] | null;
  /** Where the port is cabled now; such a row is shown but cannot end a new cable. */
  cabledTo?: string | null;
  disabled?: boolean;
  onPress: () => void;
  testID: string;
};

/**
 * One port in a list, a full-width row at least 44 px high: its card or controller and name, its
 * network, and either "Fits" or what would be wrong with the cable, in words beside the icon.
 */
export function PortRow({ label, network, notes, cabledTo, disabled, onPress, testID }: PortRowProps) {
  const fits = notes !== null && notes.length === 0;
  const detail = [network ?? 'no network', cabledTo ? `cabled to ${cabledTo}` : null].filter(Boolean).join(' · ');
  return (
    <Pressable
      role="button"
      onPress={onPress}
      disabled={disabled}
      aria-disabled={disabled || undefined}
      aria-label={`${label}, ${detail}${notes === null ? '' : fits ? ', fits' : `, ${notes.join(', ')}`}`}
      style={({ pressed }) => [styles.row, pressed && styles.pressed, disabled && styles.disabled]}
      testID={testID}
    >
      <View style={styles.text}>
        <Text variant="bodyStrong">{label}</Text>
        <Text variant="small" color="inkMuted">
          {detail}
        </Text>
      </View>
      {notes === null ? null : fits ? (
        <View style={styles.verdict}>
          <Icon name="success" size={18} color="successText" />
          <Text variant="smallStrong" color="successText">
            Fits
          </Text>
        </View>
      ) : (
        <View style={[styles.verdict, styles.notes]}>
          <Icon name="warning" size={18} color="warningText" />
          <Text variant="small" color="warningText" style={styles.noteText}>
            {notes.join(', ')}
          </Text>
        </View>
      )}
    </Pressable>
  );
}

const styles = StyleSheet.create({
  row: {
    minHeight: TAP_TARGET + 8,
    flexDirection: 'row',
    alignItems: 'center',
    gap: space.sm,
    paddingHorizontal: space.md,
    paddingVertical: space.xs,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: colors.line,
    backgroundColor: colors.surface,
  },
  pressed: { backgroundColor: colors.surfaceSunken },
  disabled: { opacity: 0.6 },
  text: { flex: 1, minWidth: 0 },
  verdict: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  notes: { flexShrink: 1, maxWidth: '50%' },
  noteText: { flexShrink: 1 },
});
