import { Linking, Platform, StyleSheet } from 'react-native';
import { Link, type Href } from 'expo-router';
import { Text, colors, fonts } from '@/components/ui';
import { inAppPath, splitLinks } from '@/lib/links';

function currentOrigin(): string | null {
  return Platform.OS === 'web' && typeof window !== 'undefined' ? window.location.origin : null;
}

/** Plain text with its web addresses clickable; addresses of this app open inside it. */
export function LinkedText({ text, testID }: { text: string; testID?: string }) {
  const origin = currentOrigin();
  return (
    <Text testID={testID} style={styles.body} selectable>
      {splitLinks(text).map((piece, i) => {
        if (piece.kind === 'text') return piece.text;
        const path = inAppPath(piece.url, origin);
        if (path) {
          return (
            <Link key={i} href={path as Href} style={styles.link} testID="mail-link">
              {piece.text}
            </Link>
          );
        }
        return (
          <Text key={i} role="link" style={styles.link} onPress={() => void Linking.openURL(piece.url)} testID="mail-link">
            {piece.text}
          </Text>
        );
      })}
    </Text>
  );
}

const styles = StyleSheet.create({
  body: { fontFamily: fonts.regular },
  link: { color: colors.primary, textDecorationLine: 'underline', fontFamily: fonts.semibold },
});
