/** Printing is a browser matter; a phone shares the PDF instead. */
export function PrintStyle() {
  return null;
}
