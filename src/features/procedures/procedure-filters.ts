import type { ProcedureSummary } from '@shared/api/procedure-types';

/**
 * Search, filters and sort of the procedures table, kept in the URL query (?q=&family=&state=&sort=) so a link
 * keeps them. Applied on the client: a shop has tens of procedures, not thousands.
 */

/**
 * Which versions a procedure has: `draft` — a draft is being written; `published` / `retired` — the state of its
 * highest-numbered version. A procedure with a published version and a new draft matches both.
 */
export type VersionState = 'draft' | 'published' | 'retired';
export const VERSION_STATES: readonly { value: VersionState; label: string }[] = [
  { value: 'draft', label: 'Has a draft' },
  { value: 'published', label: 'Published' },
  { value: 'retired', label: 'Retired' },
];

export type SortKey = 'title' | 'edited' | 'runs';
export const SORTS: readonly { key: SortKey; label: string }[] = [
  { key: 'title', label: 'Title' },
  { key: 'edited', label: 'Last edited' },
  { key: 'runs', label: 'Times run' },
];

export interface ProcedureFilters {
  /** Words that must all appear in the title, complaint or family. */
  q: string;
  family: string | null;
  state: VersionState | null;
  sort: SortKey;
}

export const NO_FILTERS: ProcedureFilters = { q: '', family: null, state: null, sort: 'title' };

type Query = Record<string, string | string[] | undefined>;
const one = (v: string | string[] | undefined) => (Array.isArray(v) ? v[0] : v);

/** The filters in a URL query; anything unknown or empty reads as "no filter" rather than an error. */
export function readFilters(query: Query): ProcedureFilters {
  const family = one(query.family)?.trim();
  const state = one(query.state);
  const sort = one(query.sort);
  return {
    q: one(query.q) ?? '',
    family: family ? family : null,
    state: VERSION_STATES.some((s) => s.value === state) ? (state as VersionState) : null,
    sort: SORTS.some((s) => s.key === sort) ? (sort as SortKey) : 'title',
  };
}

/** The URL query for the filters: defaults are left out (undefined), so a plain link stays plain. */
export function filterQuery(f: ProcedureFilters): Record<'q' | 'family' | 'state' | 'sort', string | undefined> {
  return { q: f.q || undefined, family: f.family ?? undefined, state: f.state ?? undefined, sort: f.sort === 'title' ? undefined : f.sort };
}

export function hasState(p: ProcedureSummary, state: VersionState): boolean {
  return state === 'draft' ? p.hasDraft : p.latestVersion?.status === state;
}

type FilterKey = 'q' | 'family' | 'state';

function matches(p: ProcedureSummary, f: ProcedureFilters, skip?: FilterKey): boolean {
  const words = f.q.trim().toLowerCase().split(/\s+/).filter(Boolean);
  const text = `${p.title} ${p.complaint} ${p.family}`.toLowerCase();
  return (
    (skip === 'q' || words.every((w) => text.includes(w))) &&
    (skip === 'family' || f.family === null || p.family === f.family) &&
    (skip === 'state' || f.state === null || hasState(p, f.state))
  );
}

const ORDER: Record<SortKey, (a: ProcedureSummary, b: ProcedureSummary) => number> = {
  title: (a, b) => a.title.localeCompare(b.title),
  edited: (a, b) => b.lastEditedAt.localeCompare(a.lastEditedAt),
  runs: (a, b) => b.timesRun - a.timesRun || a.title.localeCompare(b.title),
};

/** The procedures that pass the search and every filter, in the chosen order. */
export function applyFilters(list: readonly ProcedureSummary[], f: ProcedureFilters): ProcedureSummary[] {
  return list.filter((p) => matches(p, f)).sort(ORDER[f.sort]);
}

export const isFiltered = (f: ProcedureFilters) => f.q.trim() !== '' || f.family !== null || f.state !== null;

/**
 * When nothing passes: each active filter (search, family, state) that on its own hides every procedure the
 * others let through, with how many would show without it. Empty when no single filter is to blame (only
 * clearing several at once brings procedures back).
 */
export function blockingFilters(list: readonly ProcedureSummary[], f: ProcedureFilters): { key: FilterKey; without: number }[] {
  const active: FilterKey[] = (['q', 'family', 'state'] as const).filter((k) => (k === 'q' ? f.q.trim() !== '' : f[k] !== null));
  return active.map((key) => ({ key, without: list.filter((p) => matches(p, f, key)).length })).filter((b) => b.without > 0);
}

/** Machine families in the list, each with a short label for its chip (up to the first comma or bracket) and a count. */
export function familyOptions(list: readonly ProcedureSummary[]): { value: string; label: string; count: number }[] {
  const counts = new Map<string, number>();
  for (const p of list) counts.set(p.family, (counts.get(p.family) ?? 0) + 1);
  const families = [...counts.keys()].sort((a, b) => a.localeCompare(b));
  const short = (family: string) => family.split(/[,(]/)[0].trim() || family;
  return families.map((value) => {
    // Two families that shorten alike keep their full names, so no two chips read the same.
    const clash = families.some((other) => other !== value && short(other) === short(value));
    return { value, label: clash ? value : short(value), count: counts.get(value)! };
  });
}
