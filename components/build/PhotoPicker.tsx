import { createElement, useRef, type ChangeEvent } from 'react';
import { Platform, StyleSheet, View } from 'react-native';
import * as DocumentPicker from 'expo-document-picker';
import { Button, Icon, space } from '@/components/ui';

export type PickedPhoto = { file: Blob; name: string; size: number };

type PhotoPickerProps = { onPicked: (photo: PickedPhoto) => void; disabled?: boolean; testID: string };

/**
 * The phone's camera or its files. On the web two file inputs (`accept="image/*"`, one with
 * `capture` so a phone opens its camera — HTML's media capture attribute); elsewhere expo's document
 * picker, limited to images. The server judges the type by the content, whatever the picker said.
 */
export function PhotoPicker({ onPicked, disabled, testID }: PhotoPickerProps) {
  const camera = useRef<HTMLInputElement | null>(null);
  const files = useRef<HTMLInputElement | null>(null);

  if (Platform.OS !== 'web') {
    const pick = async () => {
      const picked = await DocumentPicker.getDocumentAsync({ type: ['image/jpeg', 'image/png', 'image/webp'], multiple: false });
      const asset = picked.canceled ? null : picked.assets?.[0];
      if (!asset) return;
      const file = asset.file ?? (await (await fetch(asset.uri)).blob());
      onPicked({ file, name: asset.name || 'photo', size: asset.size ?? file.size });
    };
    return <Button label="Add a photo" icon={<Icon name="camera" size={20} color="onPrimary" />} fullWidth disabled={disabled} onPress={() => void pick()} testID={testID} />;
  }

  const changed = (event: ChangeEvent<HTMLInputElement>) => {
    const file = event.target.files?.[0];
    // Let the same file be chosen again after a failed upload.
    event.target.value = '';
    if (file) onPicked({ file, name: file.name || 'photo', size: file.size });
  };
  const hidden = { display: 'none' } as const;
  return (
    <View style={styles.row}>
      {createElement('input', { ref: camera, type: 'file', accept: 'image/*', capture: 'environment', onChange: changed, style: hidden, 'data-testid': `${testID}-camera-input`, 'aria-hidden': true, tabIndex: -1 })}
      {createElement('input', { ref: files, type: 'file', accept: 'image/jpeg,image/png,image/webp', onChange: changed, style: hidden, 'data-testid': `${testID}-file-input`, 'aria-hidden': true, tabIndex: -1 })}
      <View style={styles.grow}>
        <Button label="Take a photo" icon={<Icon name="camera" size={20} color="onPrimary" />} fullWidth disabled={disabled} onPress={() => camera.current?.click()} testID={`${testID}-camera`} />
      </View>
      <View style={styles.grow}>
        <Button label="Choose a file" variant="secondary" fullWidth disabled={disabled} onPress={() => files.current?.click()} testID={`${testID}-file`} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', gap: space.sm, flexWrap: 'wrap' },
  grow: { flexGrow: 1, flexBasis: 140 },
});
