import { describe, expect, it } from 'vitest';
import type { DiagnosisSummary } from '@shared/api/diagnosis-types';
import { filterOptions, filterReplays, isDay, lastDays, localDay, machineModel, NO_FILTERS } from '@/features/replays/replay-filters';
import { formatDuration, replayPath, stepDurations } from '@/features/replays/replay-path';

const at = (day: string, time = '12:00') => new Date(`${day}T${time}:00`).toISOString();

function summary(id: string, over: Partial<DiagnosisSummary>): DiagnosisSummary {
  return {
    id,
    status: 'concluded',
    procedureId: 'p',
    procedureTitle: 'No spark',
    versionNumber: 1,
    complaint: 'Cranks, will not start',
    customerName: 'A customer',
    machine: '2019 Veltro Tessa 650',
    startedBy: 'Tomás Reyes',
    startedAt: at('2026-03-01', '09:00'),
    endedAt: at('2026-03-01', '11:00'),
    currentCheckId: 'f',
    finding: 'Pulse coil',
    stepCount: 5,
    ...over,
  };
}

const list = [
  summary('a', {}),
  summary('b', { machine: '2021 Veltro Tessa 650', startedBy: 'Dario Lindqvist', endedAt: at('2026-03-10') }),
  summary('c', { procedureTitle: 'Battery drain', machine: '2022 Veltro Marra 650', finding: 'USB socket', endedAt: at('2026-03-20') }),
];

describe('replay filters', () => {
  it('offers each value found in the list once, with its count, models without their year', () => {
    const options = filterOptions(list);
    expect(options.machine).toEqual([
      { value: 'Veltro Marra 650', count: 1 },
      { value: 'Veltro Tessa 650', count: 2 },
    ]);
    expect(options.technician.map((o) => o.value)).toEqual(['Dario Lindqvist', 'Tomás Reyes']);
    expect(machineModel('2021 Pippit Wren 150')).toBe('Pippit Wren 150');
  });

  it('combines filters, and takes both ends of a date range as whole days', () => {
    expect(filterReplays(list, NO_FILTERS).map((d) => d.id)).toEqual(['a', 'b', 'c']);
    expect(filterReplays(list, { ...NO_FILTERS, machine: 'Veltro Tessa 650', technician: 'Tomás Reyes' }).map((d) => d.id)).toEqual(['a']);
    expect(filterReplays(list, { ...NO_FILTERS, from: '2026-03-10', to: '2026-03-20' }).map((d) => d.id)).toEqual(['b', 'c']);
    expect(filterReplays(list, { ...NO_FILTERS, to: '2026-03-01' }).map((d) => d.id)).toEqual(['a']);
    expect(filterReplays(list, { ...NO_FILTERS, finding: 'USB socket', procedure: 'No spark' })).toEqual([]);
  });

  it('reads calendar days and ranges back from today', () => {
    expect(isDay('2026-02-28')).toBe(true);
    expect(isDay('2026-02-30')).toBe(false);
    expect(isDay('28/02/2026')).toBe(false);
    expect(lastDays(7, new Date(2026, 2, 3, 15))).toEqual({ from: '2026-02-25', to: '2026-03-03' });
    expect(localDay(new Date(2026, 0, 5, 23, 59))).toBe('2026-01-05');
  });
});

describe('replay path', () => {
  it('times each step from the one before it, the first from the start', () => {
    const steps = [{ recordedAt: '2026-03-01T09:06:00Z' }, { recordedAt: '2026-03-01T09:09:30Z' }, { recordedAt: '2026-03-02T10:00:00Z' }];
    expect(stepDurations('2026-03-01T09:00:00Z', steps)).toEqual([6 * 60_000, 3.5 * 60_000, (24 * 60 + 50.5) * 60_000]);
  });

  it('words durations for a step header', () => {
    expect(formatDuration(20_000)).toBe('under a minute');
    expect(formatDuration(7 * 60_000)).toBe('7 min');
    expect(formatDuration(65 * 60_000)).toBe('1 h 05 min');
    expect(formatDuration((2 * 24 + 4) * 3_600_000)).toBe('2 d 4 h');
  });

  it('separates the path taken from the detours taken back', () => {
    const steps = [
      { checkId: 'a', nextCheckId: 'b', retracted: false },
      { checkId: 'b', nextCheckId: 'f-wrong', retracted: true },
      { checkId: 'b', nextCheckId: 'c', retracted: false },
      { checkId: 'c', nextCheckId: 'f-right', retracted: false },
    ];
    const whole = replayPath(steps);
    expect([...whole.taken]).toEqual(['a→b', 'b→c', 'c→f-right']);
    expect([...whole.detours]).toEqual(['b→f-wrong']);
    expect([...whole.visited]).toEqual(['a', 'b', 'c', 'f-right']);
    expect([...replayPath(steps, 1).visited]).toEqual(['a', 'b']);
  });
});
