import type { PracticeAttemptView } from '@shared/api/replay-types';

/** One pass through a replay in practice mode, from its scored answers. */
export interface PracticeRun {
  runId: string;
  userId: string;
  userName: string;
  diagnosisId: string;
  procedureTitle: string;
  machine: string;
  /** When its first answer was given. */
  startedAt: string;
  right: number;
  answered: number;
}

export interface MemberPractice {
  userId: string;
  userName: string;
  runs: number;
  right: number;
  answered: number;
  lastAt: string;
}

/** Answers grouped into passes, newest pass first. */
export function practiceRuns(attempts: readonly PracticeAttemptView[]): PracticeRun[] {
  const runs = new Map<string, PracticeRun>();
  for (const a of attempts) {
    let run = runs.get(a.runId);
    if (!run) {
      run = { runId: a.runId, userId: a.userId, userName: a.userName, diagnosisId: a.diagnosisId, procedureTitle: a.procedureTitle, machine: a.machine, startedAt: a.createdAt, right: 0, answered: 0 };
      runs.set(a.runId, run);
    }
    run.answered += 1;
    if (a.correct) run.right += 1;
    if (a.createdAt < run.startedAt) run.startedAt = a.createdAt;
  }
  return [...runs.values()].sort((a, b) => b.startedAt.localeCompare(a.startedAt));
}

/** Per member: passes, answers and right answers, for a lead's view of the team. */
export function practiceByMember(runs: readonly PracticeRun[]): MemberPractice[] {
  const members = new Map<string, MemberPractice>();
  for (const r of runs) {
    const m = members.get(r.userId) ?? { userId: r.userId, userName: r.userName, runs: 0, right: 0, answered: 0, lastAt: r.startedAt };
    m.runs += 1;
    m.right += r.right;
    m.answered += r.answered;
    if (r.startedAt > m.lastAt) m.lastAt = r.startedAt;
    members.set(r.userId, m);
  }
  return [...members.values()].sort((a, b) => a.userName.localeCompare(b.userName));
}

/** "71 %", or a dash when nothing was answered. */
export const percent = (right: number, answered: number) => (answered === 0 ? '—' : `${Math.round((100 * right) / answered)} %`);
