import { describe, expect, it } from 'vitest';
import type { ProcedureSummary } from '@shared/api/procedure-types';
import { applyFilters, blockingFilters, familyOptions, filterQuery, NO_FILTERS, readFilters } from '@/features/procedures/procedure-filters';

// Filtering rules of our own table (common practice, no source).
const proc = (over: Partial<ProcedureSummary> & Pick<ProcedureSummary, 'id' | 'title'>): ProcedureSummary => ({
  complaint: 'cranks but no spark',
  family: 'Pippit Wren 125 and 150 scooters, 2016–2023',
  latestPublished: 1,
  hasDraft: false,
  latestVersion: { number: 1, status: 'published' },
  createdAt: '2026-01-01T00:00:00.000Z',
  lastEditedAt: '2026-01-01T00:00:00.000Z',
  lastEditedBy: 'Dario',
  timesRun: 0,
  ...over,
});

const list = [
  proc({ id: 'a', title: 'No spark', timesRun: 4 }),
  proc({ id: 'b', title: 'Battery drain', family: 'Nordane Fellrunner 450 and 570 ATVs, 2015–2022', hasDraft: true, lastEditedAt: '2026-03-01T00:00:00.000Z' }),
  proc({ id: 'c', title: 'Headlight dead', family: 'Nordane Fellrunner 450 and 570 ATVs, 2015–2022', latestPublished: null, latestVersion: { number: 2, status: 'retired' } }),
  proc({ id: 'd', title: 'Charging', latestPublished: null, latestVersion: null, hasDraft: true, timesRun: 9 }),
];
const ids = (rows: ProcedureSummary[]) => rows.map((r) => r.id);

describe('readFilters and filterQuery', () => {
  it('reads a query, ignoring unknown states and sorts instead of failing', () => {
    expect(readFilters({ q: 'spark', family: ' Pippit ', state: 'retired', sort: 'runs' })).toEqual({ q: 'spark', family: 'Pippit', state: 'retired', sort: 'runs' });
    expect(readFilters({ state: 'archived', sort: 'colour', family: '' })).toEqual(NO_FILTERS);
    expect(readFilters({ state: ['draft', 'published'] }).state).toBe('draft');
  });

  it('round-trips through the URL and leaves defaults out', () => {
    const f = { q: 'no spark', family: 'Pippit Wren 125 and 150 scooters, 2016–2023', state: 'draft' as const, sort: 'edited' as const };
    expect(readFilters(filterQuery(f))).toEqual(f);
    expect(filterQuery(NO_FILTERS)).toEqual({ q: undefined, family: undefined, state: undefined, sort: undefined });
  });
});

describe('applyFilters', () => {
  it('needs every search word, in any of title, complaint or family', () => {
    expect(ids(applyFilters(list, { ...NO_FILTERS, q: 'nordane dead' }))).toEqual(['c']);
    // Every fixture's complaint says "no spark"; case does not matter; title order by default.
    expect(ids(applyFilters(list, { ...NO_FILTERS, q: 'SPARK' }))).toEqual(['b', 'd', 'c', 'a']);
  });

  it('filters by the state of the versions: a draft, the latest published, the latest retired', () => {
    expect(ids(applyFilters(list, { ...NO_FILTERS, state: 'draft' }))).toEqual(['b', 'd']);
    expect(ids(applyFilters(list, { ...NO_FILTERS, state: 'published' }))).toEqual(['b', 'a']);
    expect(ids(applyFilters(list, { ...NO_FILTERS, state: 'retired' }))).toEqual(['c']);
  });

  it('combines family and state, and sorts', () => {
    const nordane = 'Nordane Fellrunner 450 and 570 ATVs, 2015–2022';
    expect(ids(applyFilters(list, { ...NO_FILTERS, family: nordane, state: 'draft' }))).toEqual(['b']);
    expect(ids(applyFilters(list, { ...NO_FILTERS, sort: 'runs' }))).toEqual(['d', 'a', 'b', 'c']);
    expect(ids(applyFilters(list, { ...NO_FILTERS, sort: 'edited' }))[0]).toBe('b');
  });
});

describe('blockingFilters', () => {
  it('names the one filter that hides everything, with how many show without it', () => {
    const f = { ...NO_FILTERS, family: 'Pippit Wren 125 and 150 scooters, 2016–2023', state: 'retired' as const };
    expect(applyFilters(list, f)).toEqual([]);
    // Without the state filter, the two Pippit procedures show; without the family filter, the retired one.
    expect(blockingFilters(list, f)).toEqual([
      { key: 'family', without: 1 },
      { key: 'state', without: 2 },
    ]);
  });

  it('names nothing when only clearing several filters at once helps', () => {
    const f = { ...NO_FILTERS, q: 'zzz', state: 'retired' as const, family: 'Pippit Wren 125 and 150 scooters, 2016–2023' };
    expect(blockingFilters(list, f)).toEqual([]);
  });
});

describe('familyOptions', () => {
  it('shortens each family to its name before the first comma or bracket, with a count', () => {
    expect(familyOptions(list)).toEqual([
      { value: 'Nordane Fellrunner 450 and 570 ATVs, 2015–2022', label: 'Nordane Fellrunner 450 and 570 ATVs', count: 2 },
      { value: 'Pippit Wren 125 and 150 scooters, 2016–2023', label: 'Pippit Wren 125 and 150 scooters', count: 2 },
    ]);
  });

  it('keeps full names when two families would shorten alike', () => {
    const two = [proc({ id: 'x', title: 'x', family: 'Veltro 650, carburetted' }), proc({ id: 'y', title: 'y', family: 'Veltro 650 (injected)' })];
    expect(familyOptions(two).map((o) => o.label)).toEqual(['Veltro 650 (injected)', 'Veltro 650, carburetted']);
  });
});
