export interface PhotoImageProps {
  photoId: string;
  /** What the photo shows, for those who cannot see it. */
  alt: string;
  width: number | `${number}%`;
  height: number;
  fit?: 'cover' | 'contain';
  testID?: string;
}
