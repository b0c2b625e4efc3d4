import { Pressable, StyleSheet, View } from 'react-native';
import { Text, colors, radius, space, TAP_TARGET } from '@/components/ui';
import { EditorIcon, type EditorIconName } from '@/components/editor/EditorIcons';

type IconButtonProps = {
  icon: EditorIconName;
  /** Spoken and shown as a tooltip; shown beside the icon when `showLabel`. */
  label: string;
  onPress: () => void;
  disabled?: boolean;
  showLabel?: boolean;
  active?: boolean;
  tone?: 'plain' | 'primary';
  testID?: string;
  /** The keyboard shortcut, added to the tooltip. */
  shortcut?: string;
};

/** A 44 px toolbar button: an icon, its name for assistive technology and a tooltip on the web. */
export function IconButton({ icon, label, onPress, disabled, showLabel, active, tone = 'plain', testID, shortcut }: IconButtonProps) {
  const primary = tone === 'primary';
  const title = shortcut ? `${label} (${shortcut})` : label;
  return (
    <Pressable
      role="button"
      accessibilityRole="button"
      aria-label={label}
      aria-disabled={disabled}
      aria-pressed={active}
      disabled={disabled}
      onPress={onPress}
      testID={testID}
      {...webTitle(title)}
      style={({ pressed }) => [styles.button, showLabel && styles.labelled, primary && styles.primary, active && styles.active, pressed && (primary ? styles.primaryPressed : styles.pressed), disabled && styles.disabled]}
    >
      <View style={styles.content}>
        <EditorIcon name={icon} color={primary ? 'onPrimary' : active ? 'primary' : 'ink'} />
        {showLabel ? (
          <Text variant="smallStrong" color={primary ? 'onPrimary' : 'primary'} numberOfLines={1}>
            {label}
          </Text>
        ) : null}
      </View>
    </Pressable>
  );
}

/** react-native-web renders `title` as the element's tooltip; React Native's types do not list it. */
function webTitle(title: string): object {
  return { title };
}

const styles = StyleSheet.create({
  button: { minWidth: TAP_TARGET, minHeight: TAP_TARGET, borderRadius: radius.md, alignItems: 'center', justifyContent: 'center' },
  labelled: { paddingHorizontal: space.md },
  content: { flexDirection: 'row', alignItems: 'center', gap: space.xs },
  pressed: { backgroundColor: colors.surfaceSunken },
  active: { backgroundColor: colors.primarySoft },
  primary: { backgroundColor: colors.primary },
  primaryPressed: { backgroundColor: colors.primaryPressed },
  disabled: { opacity: 0.4 },
});
