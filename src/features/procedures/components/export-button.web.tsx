import { useState } from 'react';
import { type ProcedureFile, procedureFileName } from '@shared/procedures/exchange-format';
import { pictureIdsOf } from '@shared/procedures/pictures';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { Text } from '@/components/ui/text';
import { api } from '@/lib/api';

/**
 * Downloads the procedure as a probepath.procedure file: a version by number, or without one the latest
 * published version (the draft when none is published). A failure shows under the button, and so does a
 * reminder when the file names pictures, which stay in this shop.
 */
export function ExportButton({ procedureId, version, label, ariaLabel, testID }: { procedureId: string; version?: number; label: string; ariaLabel: string; testID: string }) {
  const [busy, setBusy] = useState(false);
  const [failed, setFailed] = useState<string | null>(null);
  const [pictures, setPictures] = useState(0);
  const download = async () => {
    setBusy(true);
    setFailed(null);
    setPictures(0);
    try {
      const file = await api<ProcedureFile>(`/api/procedures/${procedureId}/export${version ? `?version=${version}` : ''}`);
      const url = URL.createObjectURL(new Blob([JSON.stringify(file, null, 2)], { type: 'application/json' }));
      const anchor = document.createElement('a');
      anchor.href = url;
      anchor.download = procedureFileName(file.title, file.exportedFrom);
      document.body.appendChild(anchor);
      anchor.click();
      anchor.remove();
      // The click has handed the file to the browser; the URL is not needed after this turn.
      setTimeout(() => URL.revokeObjectURL(url), 0);
      setPictures(pictureIdsOf(file.document).length);
    } catch (error) {
      setFailed(error instanceof Error ? error.message : 'The file could not be exported. Try again.');
    } finally {
      setBusy(false);
    }
  };
  return (
    <>
      <Button testID={testID} label={label} ariaLabel={ariaLabel} icon="download" loading={busy} onPress={() => void download()} />
      <FormError testID={`${testID}-error`} message={failed} />
      {pictures ? (
        <Text variant="small" tone="textMuted" role="status" testID={`${testID}-pictures`}>
          {`The file names ${pictures === 1 ? 'a picture' : `${pictures} pictures`} kept in this shop: it imports with ${pictures === 1 ? 'it' : 'them'} only here. For another shop, remove the pictures from the file and upload them there.`}
        </Text>
      ) : null}
    </>
  );
}
