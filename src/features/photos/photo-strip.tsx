import { useState } from 'react';
import { Modal, Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';
import { Button } from '@/components/ui/button';
import { Text } from '@/components/ui/text';
import { space, useTheme } from '@/lib/theme';
import { PhotoImage } from './photo-image';

/** A picture in the strip: a diagnosis photo by id, or any stored picture by its path with what it shows. */
export interface StripPicture {
  id: string;
  /** Where the bytes are served; a diagnosis photo's by default. */
  path?: string;
  /** What it shows; without one, "Photo 1 of …". */
  alt?: string;
}

interface PhotoStripProps {
  photos: readonly StripPicture[];
  /** Says what the photos are of, e.g. "Pulse coil resistance": each is announced as "Photo 1 of Pulse coil resistance". */
  of: string;
  size?: { width: number; height: number };
  /** Print each picture's description under it and under the large view. */
  captions?: boolean;
  testID: string;
}

/** Thumbnails in a wrapping row; a tap shows the photo large. */
export function PhotoStrip({ photos, of, size = { width: 148, height: 111 }, captions = false, testID }: PhotoStripProps) {
  const colors = useTheme();
  const [open, setOpen] = useState<number | null>(null);
  const { height: screenHeight } = useWindowDimensions();
  if (!photos.length) return null;
  const alt = (i: number) => photos[i].alt ?? `Photo ${i + 1} of ${of}`;
  const path = (p: StripPicture) => p.path ?? `/api/photos/${p.id}`;
  const shown = open !== null ? photos[open] : undefined;
  return (
    <View testID={testID} style={styles.row}>
      {photos.map((p, i) => (
        <Pressable key={`${i}:${p.id}`} role="button" aria-label={`${alt(i)}: show large`} onPress={() => setOpen(i)} testID={`${testID}-${i}`} style={{ width: size.width }}>
          <PhotoImage path={path(p)} alt={alt(i)} width={size.width} height={size.height} />
          {captions ? (
            <Text variant="small" tone="textMuted" numberOfLines={3} style={styles.caption}>
              {alt(i)}
            </Text>
          ) : null}
        </Pressable>
      ))}
      <Modal visible={shown !== undefined} transparent animationType="none" onRequestClose={() => setOpen(null)}>
        <View style={[styles.backdrop, { backgroundColor: 'rgba(11,15,19,0.92)' }]}>
          {shown && open !== null ? <PhotoImage path={path(shown)} alt={alt(open)} width="100%" height={screenHeight - (captions ? 200 : 140)} fit="contain" /> : null}
          {captions && open !== null ? <Text tone="onChrome">{alt(open)}</Text> : null}
          <Button testID={`${testID}-close`} label="Close" variant="secondary" onPress={() => setOpen(null)} style={{ borderColor: colors.onChrome }} />
        </View>
      </Modal>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  caption: { marginTop: space.xs },
  backdrop: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.lg, padding: space.lg },
});
