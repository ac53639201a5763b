import type { Check } from '@shared/engine/procedure';
import { procedurePicturePath } from '@shared/procedures/pictures';
import { PhotoStrip } from '@/features/photos/photo-strip';

/** The check's diagrams and photos with what each shows; a tap opens one large. The bench, preview and replays all show them so. */
export function CheckPictures({ check, size = { width: 160, height: 120 }, testID = 'check-pictures' }: { check: Check; size?: { width: number; height: number }; testID?: string }) {
  if (!check.pictures?.length) return null;
  const pictures = check.pictures.map((p) => ({ id: p.src, path: procedurePicturePath(p.src), alt: p.alt }));
  return <PhotoStrip photos={pictures} of={check.title} size={size} captions testID={testID} />;
}
