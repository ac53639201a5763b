/** Exporting a procedure file is a desk task in the browser, like importing one; the phone app offers no download. */
export function ExportButton(_props: { procedureId: string; version?: number; label: string; ariaLabel: string; testID: string }) {
  return null;
}
