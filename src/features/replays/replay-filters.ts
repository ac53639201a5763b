import type { DiagnosisSummary } from '@shared/api/diagnosis-types';

/**
 * Filters of the replay list, applied on the client (the list holds at most 200 diagnoses). Dates are local
 * calendar days, "YYYY-MM-DD", both ends included, matched against the day the diagnosis was concluded.
 */
export interface ReplayFilters {
  procedure: string | null;
  finding: string | null;
  machine: string | null;
  technician: string | null;
  from: string | null;
  to: string | null;
}

export type ChoiceKey = 'procedure' | 'finding' | 'machine' | 'technician';

export const NO_FILTERS: ReplayFilters = { procedure: null, finding: null, machine: null, technician: null, from: null, to: null };

/** The model without its year: "2019 Veltro Tessa 250" → "Veltro Tessa 250". */
export const machineModel = (machine: string) => machine.replace(/^\d{4}\s+/, '');

const VALUE_OF: Record<ChoiceKey, (d: DiagnosisSummary) => string | null> = {
  procedure: (d) => d.procedureTitle,
  finding: (d) => d.finding,
  machine: (d) => machineModel(d.machine),
  technician: (d) => d.startedBy,
};
const CHOICE_KEYS = Object.keys(VALUE_OF) as ChoiceKey[];

/** Each filter's choices: the values found in the list, sorted, each with how many diagnoses have it. */
export function filterOptions(list: readonly DiagnosisSummary[]): Record<ChoiceKey, { value: string; count: number }[]> {
  const options = {} as Record<ChoiceKey, { value: string; count: number }[]>;
  for (const key of CHOICE_KEYS) {
    const counts = new Map<string, number>();
    for (const d of list) {
      const value = VALUE_OF[key](d);
      if (value !== null) counts.set(value, (counts.get(value) ?? 0) + 1);
    }
    options[key] = [...counts].map(([value, count]) => ({ value, count })).sort((a, b) => a.value.localeCompare(b.value));
  }
  return options;
}

/** The local calendar day of an instant, "YYYY-MM-DD". */
export function localDay(at: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${at.getFullYear()}-${pad(at.getMonth() + 1)}-${pad(at.getDate())}`;
}

const DAY = /^(\d{4})-(\d{2})-(\d{2})$/;

/** True for a real calendar day written YYYY-MM-DD. */
export function isDay(text: string): boolean {
  const m = DAY.exec(text);
  if (!m) return false;
  const d = new Date(Number(m[1]), Number(m[2]) - 1, Number(m[3]));
  return localDay(d) === text;
}

/** The last `days` days up to today, as a from–to range. */
export function lastDays(days: number, now: Date): Pick<ReplayFilters, 'from' | 'to'> {
  const from = new Date(now.getFullYear(), now.getMonth(), now.getDate() - (days - 1));
  return { from: localDay(from), to: localDay(now) };
}

/** The diagnoses that pass every filter. */
export function filterReplays(list: readonly DiagnosisSummary[], filters: ReplayFilters): DiagnosisSummary[] {
  return list.filter((d) => {
    if (!CHOICE_KEYS.every((key) => filters[key] === null || VALUE_OF[key](d) === filters[key])) return false;
    const day = localDay(new Date(d.endedAt ?? d.startedAt));
    return (filters.from === null || day >= filters.from) && (filters.to === null || day <= filters.to);
  });
}

export const activeFilterCount = (f: ReplayFilters) => CHOICE_KEYS.filter((k) => f[k] !== null).length + (f.from !== null || f.to !== null ? 1 : 0);
