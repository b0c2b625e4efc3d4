import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Path } from 'react-native-svg';
import { Text, colors, space } from '@/components/ui';

/** Cablewright's mark: two ports joined by two separate cables — the redundancy the product proves. */
export function BrandGlyph({ size = 28, light = false }: { size?: number; light?: boolean }) {
  const line = light ? colors.onSidebar : colors.primary;
  return (
    <Svg width={size} height={size} viewBox="0 0 32 32" aria-hidden focusable={false}>
      <Path d="M8 9c6 0 10 4 16 0" stroke={line} strokeWidth={2.4} fill="none" strokeLinecap="round" />
      <Path d="M8 23c6 0 10-4 16 0" stroke={line} strokeWidth={2.4} fill="none" strokeLinecap="round" />
      <Circle cx={6} cy={16} r={4} fill={colors.copper} />
      <Circle cx={26} cy={16} r={4} fill={light ? colors.copperSoft : colors.copper} />
      <Path d="M6 12v-3M6 20v3M26 12v-3M26 20v3" stroke={line} strokeWidth={2.4} strokeLinecap="round" />
    </Svg>
  );
}

export function BrandMark({ light = false }: { light?: boolean }) {
  return (
    <View style={styles.row}>
      <BrandGlyph light={light} />
      <Text variant="heading" color={light ? 'onSidebar' : 'ink'}>
        Cablewright
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({ row: { flexDirection: 'row', alignItems: 'center', gap: space.sm } });
