/** On a phone the PDF reaches the customer by e-mail; saving and printing are for the browser. */
export function ReportFileActions(_props: { diagnosisId: string }) {
  return null;
}
