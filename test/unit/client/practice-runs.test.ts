import { describe, expect, it } from 'vitest';
import type { PracticeAttemptView } from '@shared/api/replay-types';
import { percent, practiceByMember, practiceRuns } from '@/features/replays/practice-runs';

function attempt(runId: string, userName: string, correct: boolean, createdAt: string): PracticeAttemptView {
  return {
    id: `${runId}-${createdAt}`,
    runId,
    diagnosisId: 'd1',
    stepSeq: 1,
    checkId: 'c',
    asked: 'verdict',
    answer: 'low',
    correct,
    expected: 'low',
    userId: `u-${userName}`,
    userName,
    procedureTitle: 'No spark',
    machine: '2016 Veltro Tessa 650',
    createdAt,
  };
}

const attempts = [
  attempt('r2', 'Inès', true, '2026-03-02T10:05:00Z'),
  attempt('r1', 'Inès', false, '2026-03-01T09:02:00Z'),
  attempt('r2', 'Inès', false, '2026-03-02T10:01:00Z'),
  attempt('r1', 'Inès', true, '2026-03-01T09:00:00Z'),
  attempt('r3', 'Noor', true, '2026-03-03T08:00:00Z'),
];

describe('practice history', () => {
  it('groups answers into passes, newest first, each dated by its first answer', () => {
    expect(practiceRuns(attempts).map((r) => [r.runId, r.right, r.answered, r.startedAt])).toEqual([
      ['r3', 1, 1, '2026-03-03T08:00:00Z'],
      ['r2', 1, 2, '2026-03-02T10:01:00Z'],
      ['r1', 1, 2, '2026-03-01T09:00:00Z'],
    ]);
  });

  it('sums passes per member for the team view', () => {
    expect(practiceByMember(practiceRuns(attempts)).map((m) => [m.userName, m.runs, m.right, m.answered, m.lastAt])).toEqual([
      ['Inès', 2, 2, 4, '2026-03-02T10:01:00Z'],
      ['Noor', 1, 1, 1, '2026-03-03T08:00:00Z'],
    ]);
  });

  it('words a share of right answers', () => {
    expect(percent(5, 7)).toBe('71 %');
    expect(percent(0, 0)).toBe('—');
  });
});
