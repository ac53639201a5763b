import type { PhotoFile } from './photo-file';

export interface PhotoPickerProps {
  /** Called once for each picture picked or taken. */
  onPick: (file: PhotoFile) => unknown;
  /** An upload is under way: the button shows a spinner. */
  busy?: boolean;
  disabled?: boolean;
  label?: string;
  testID: string;
}
