import { StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/Text';

/** A small label over its value: the facts on the account and invitation screens. */
export function LabeledValue({ label, value, testID }: { label: string; value: string; testID?: string }) {
  return (
    <View style={styles.wrap}>
      <Text variant="small" color="inkMuted">
        {label}
      </Text>
      <Text variant="bodyStrong" testID={testID}>
        {value}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: 2 } });
