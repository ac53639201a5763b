/** Longest title a procedure may have (createProcedureSchema). */
const TITLE_MAX = 120;
const COPY_SUFFIX = /\s\(copy(?: (\d+))?\)$/;

/**
 * The title of a copy: "No spark (copy)", then "No spark (copy 2)", "(copy 3)"… so that no two copies share a
 * title. Copying a copy numbers from the original's title instead of stacking "(copy) (copy)". The original is
 * shortened when needed so the result stays within the 120-character title limit.
 */
export function copyTitle(title: string, taken: Iterable<string>): string {
  const base = title.replace(COPY_SUFFIX, '');
  const used = new Set(taken);
  for (let n = 1; ; n++) {
    const suffix = n === 1 ? ' (copy)' : ` (copy ${n})`;
    const candidate = base.slice(0, TITLE_MAX - suffix.length).trimEnd() + suffix;
    if (!used.has(candidate)) return candidate;
  }
}
