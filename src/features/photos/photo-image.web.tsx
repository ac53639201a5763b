import { useEffect, useState } from 'react';
import { ActivityIndicator, Image, StyleSheet, View } from 'react-native';
import { Text } from '@/components/ui/text';
import { apiRaw } from '@/lib/api';
import { useTheme } from '@/lib/theme';
import type { PhotoImageProps } from './photo-image-props';

/** On the web a photo is fetched with the session's token and shown from a blob URL, released when it goes. */
export function PhotoImage({ path, alt, width, height, fit = 'cover', testID }: PhotoImageProps) {
  const colors = useTheme();
  const [url, setUrl] = useState<string | null>(null);
  const [failed, setFailed] = useState(false);

  useEffect(() => {
    let objectUrl: string | null = null;
    let gone = false;
    setUrl(null);
    setFailed(false);
    apiRaw(path)
      .then((r) => r.blob())
      .then((blob) => {
        if (gone) return;
        objectUrl = URL.createObjectURL(blob);
        setUrl(objectUrl);
      })
      .catch(() => !gone && setFailed(true));
    return () => {
      gone = true;
      if (objectUrl) URL.revokeObjectURL(objectUrl);
    };
  }, [path]);

  const box = { width, height, backgroundColor: fit === 'cover' ? colors.surfaceSunken : 'transparent' };
  if (url) return <Image testID={testID} source={{ uri: url }} alt={alt} resizeMode={fit} style={[styles.image, box]} />;
  return (
    <View testID={testID} role="img" aria-label={alt} style={[styles.image, styles.center, box]}>
      {failed ? (
        <Text variant="small" tone="textMuted" style={styles.failed}>
          Picture could not load
        </Text>
      ) : (
        <ActivityIndicator color={colors.textMuted} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  image: { borderRadius: 8 },
  center: { alignItems: 'center', justifyContent: 'center' },
  failed: { textAlign: 'center', padding: 8 },
});
