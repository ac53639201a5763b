import { type ChangeEvent, useRef } from 'react';
import { PHOTO_TYPES } from '@shared/photos/schemas';
import { Button } from '@/components/ui/button';
import type { PhotoPickerProps } from './photo-picker-props';

/**
 * On the web: one button that opens the browser's file picker (on a phone it
 * offers the camera too). Every picked file is handed over on its own.
 */
export function PhotoPicker({ onPick, busy = false, disabled = false, label = 'Add photo', testID }: PhotoPickerProps) {
  const input = useRef<HTMLInputElement>(null);
  const picked = (e: ChangeEvent<HTMLInputElement>) => {
    for (const file of Array.from(e.target.files ?? [])) void onPick(file);
    // Picking the same file again must fire `change` again.
    e.target.value = '';
  };
  return (
    <>
      <Button testID={testID} label={label} icon="plus" loading={busy} disabled={disabled} onPress={() => input.current?.click()} />
      <input
        ref={input}
        data-testid={`${testID}-input`}
        type="file"
        accept={PHOTO_TYPES.join(',')}
        multiple
        hidden
        aria-hidden
        tabIndex={-1}
        onChange={picked}
      />
    </>
  );
}
