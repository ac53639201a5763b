import { useRef } from 'react';
import { Button } from '@/components/ui/button';

/** Picks a .json procedure file and hands over its parsed content (or the reason it could not be read). */
export function ImportButton({ onFile, loading }: { onFile: (content: unknown | Error) => void; loading: boolean }) {
  const input = useRef<HTMLInputElement>(null);
  return (
    <>
      <input
        ref={input}
        type="file"
        accept="application/json,.json"
        data-testid="import-file"
        aria-label="Procedure file to import"
        style={{ display: 'none' }}
        onChange={async (event) => {
          const file = event.currentTarget.files?.[0];
          event.currentTarget.value = '';
          if (!file) return;
          try {
            onFile(JSON.parse(await file.text()) as unknown);
          } catch {
            onFile(new Error(`“${file.name}” is not a JSON file. Pick a file exported from Probepath (…probepath.json).`));
          }
        }}
      />
      <Button testID="import-procedure" label="Import" icon="upload" loading={loading} onPress={() => input.current?.click()} />
    </>
  );
}
