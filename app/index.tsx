import { Text, View } from 'react-native';

export default function Index() {
  return (
    <View>
      <Text>Cablewright</Text>
    </View>
  );
}
