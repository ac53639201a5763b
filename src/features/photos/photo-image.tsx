import { Image, StyleSheet } from 'react-native';
import { authHeaders } from '@/lib/api';
import { useTheme } from '@/lib/theme';
import type { PhotoImageProps } from './photo-image-props';

/** On a phone the image view loads the photo itself, with the session's token in its request headers. */
export function PhotoImage({ path, alt, width, height, fit = 'cover', testID }: PhotoImageProps) {
  const colors = useTheme();
  return (
    <Image
      testID={testID}
      source={{ uri: path, headers: authHeaders() }}
      alt={alt}
      resizeMode={fit}
      style={[styles.image, { width, height, backgroundColor: fit === 'cover' ? colors.surfaceSunken : 'transparent' }]}
    />
  );
}

const styles = StyleSheet.create({
  image: { borderRadius: 8 },
});
