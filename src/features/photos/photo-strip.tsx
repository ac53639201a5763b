import { useState } from 'react';
import { Modal, Pressable, StyleSheet, useWindowDimensions, View } from 'react-native';
import type { PhotoView } from '@shared/api/diagnosis-types';
import { Button } from '@/components/ui/button';
import { space, useTheme } from '@/lib/theme';
import { PhotoImage } from './photo-image';

interface PhotoStripProps {
  photos: PhotoView[];
  /** Says what the photos are of, e.g. "Pulse coil resistance": each is announced as "Photo 1 of Pulse coil resistance". */
  of: string;
  size?: { width: number; height: number };
  testID: string;
}

/** Thumbnails in a wrapping row; a tap shows the photo large. */
export function PhotoStrip({ photos, of, size = { width: 148, height: 111 }, testID }: PhotoStripProps) {
  const colors = useTheme();
  const [open, setOpen] = useState<PhotoView | null>(null);
  const { height: screenHeight } = useWindowDimensions();
  if (!photos.length) return null;
  const alt = (i: number) => `Photo ${i + 1} of ${of}`;
  return (
    <View testID={testID} style={styles.row}>
      {photos.map((p, i) => (
        <Pressable key={p.id} role="button" aria-label={`${alt(i)}: show large`} onPress={() => setOpen(p)} testID={`${testID}-${i}`}>
          <PhotoImage photoId={p.id} alt={alt(i)} width={size.width} height={size.height} />
        </Pressable>
      ))}
      <Modal visible={open !== null} transparent animationType="none" onRequestClose={() => setOpen(null)}>
        <View style={[styles.backdrop, { backgroundColor: 'rgba(11,15,19,0.92)' }]}>
          {open ? <PhotoImage photoId={open.id} alt={alt(photos.indexOf(open))} width="100%" height={screenHeight - 140} fit="contain" /> : null}
          <Button testID={`${testID}-close`} label="Close" variant="secondary" onPress={() => setOpen(null)} style={{ borderColor: colors.onChrome }} />
        </View>
      </Modal>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: space.sm },
  backdrop: { flex: 1, alignItems: 'center', justifyContent: 'center', gap: space.lg, padding: space.lg },
});
