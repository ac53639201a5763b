/** Importing a procedure file is a desk task in the browser; the phone app offers no file picker. */
export function ImportButton(_props: { onFile: (content: unknown | Error) => void; loading: boolean }) {
  return null;
}
