export interface PhotoImageProps {
  /** Where the API serves the bytes, e.g. `/api/photos/<id>` or a procedure picture's path. */
  path: string;
  /** What the photo shows, for those who cannot see it. */
  alt: string;
  width: number | `${number}%`;
  height: number;
  fit?: 'cover' | 'contain';
  testID?: string;
}
