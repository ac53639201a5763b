import * as ImagePicker from 'expo-image-picker';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { space } from '@/lib/theme';
import type { PhotoPickerProps } from './photo-picker-props';

const OPTIONS: ImagePicker.ImagePickerOptions = { mediaTypes: ['images'], quality: 0.8, allowsMultipleSelection: false };

/** On a phone: take a photo with the camera or pick one from the library (expo-image-picker). */
export function PhotoPicker({ onPick, busy = false, disabled = false, label = 'Add photo', testID }: PhotoPickerProps) {
  const [denied, setDenied] = useState(false);

  const run = async (camera: boolean) => {
    if (camera) {
      const permission = await ImagePicker.requestCameraPermissionsAsync();
      setDenied(!permission.granted);
      if (!permission.granted) return;
    }
    const result = camera ? await ImagePicker.launchCameraAsync(OPTIONS) : await ImagePicker.launchImageLibraryAsync(OPTIONS);
    if (result.canceled) return;
    for (const asset of result.assets) {
      onPick({ uri: asset.uri, name: asset.fileName ?? 'photo.jpg', type: asset.mimeType ?? 'image/jpeg', size: asset.fileSize });
    }
  };

  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        <Button testID={`${testID}-camera`} label="Take photo" ariaLabel={`${label}: take photo`} icon="plus" loading={busy} disabled={disabled} onPress={() => void run(true)} />
        <Button testID={`${testID}-library`} label="Choose photo" ariaLabel={`${label}: choose photo`} disabled={disabled || busy} onPress={() => void run(false)} />
      </View>
      {denied ? (
        <Text variant="small" tone="textMuted">
          Probepath may not use the camera. Allow it in the phone’s settings, or choose a photo instead.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
});
