import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { FormError } from '@/components/ui/form-error';
import { ApiError, apiRaw } from '@/lib/api';

/** In the browser: save the server's PDF under its own file name, or print this page (see print-style.web). */
export function ReportFileActions({ diagnosisId }: { diagnosisId: string }) {
  const [saving, setSaving] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const download = async () => {
    setSaving(true);
    setError(null);
    try {
      const response = await apiRaw(`/api/diagnoses/${diagnosisId}/report.pdf`);
      const name = /filename="([^"]+)"/.exec(response.headers.get('content-disposition') ?? '')?.[1] ?? 'report.pdf';
      const url = URL.createObjectURL(await response.blob());
      const link = Object.assign(document.createElement('a'), { href: url, download: name });
      document.body.append(link);
      link.click();
      link.remove();
      setTimeout(() => URL.revokeObjectURL(url), 10_000);
    } catch (err) {
      setError(err instanceof ApiError ? err.message : 'The PDF could not be saved on this device. Try again.');
    } finally {
      setSaving(false);
    }
  };

  return (
    <>
      <Button testID="report-download" label="Download PDF" icon="report" variant="primary" loading={saving} onPress={() => void download()} />
      <Button testID="report-print" label="Print" onPress={() => window.print()} />
      <FormError message={error} testID="report-download-error" />
    </>
  );
}
