import type { Check, ProcedureDocument } from '../engine/procedure';

/**
 * What the concluded diagnoses of one procedure version say about it: how often each finding and each
 * outcome came up, how long checks take, the expected number of checks and time to a finding, and a cheap
 * check that often decides the case but sits late in the order. Pure; the server feeds it from the database.
 */

export interface InsightDiagnosis {
  startedAt: string;
  endedAt: string | null;
  findingCheckId: string | null;
  /** Every step in order, retracted ones included (their time is part of the next step's). */
  steps: { checkId: string; nextCheckId: string | null; retracted: boolean; recordedAt: string }[];
}

export interface EdgeCount {
  from: string;
  to: string;
  count: number;
}

export interface CheckInsight {
  checkId: string;
  /** Steps on the path (taken-back ones left out). */
  visits: number;
  medianMs: number;
  meanMs: number;
  /** Share of the visits whose next check was a finding. */
  decides: number;
  /** Mean 1-based position on the path. */
  meanPosition: number;
}

export interface Expectation {
  /** Expected number of checks from the first one to a finding. */
  checks: number;
  /** Expected time to a finding, in ms (mean step times along the observed branch frequencies). */
  ms: number;
}

export interface OrderSuggestion {
  checkId: string;
  /** The check it comes after on average although it is the better first bet. */
  afterCheckId: string;
  /** Mean time / share decided, ms: lower is a better early check (the sequential-testing rule). */
  index: number;
  /** Null when the earlier check never decided a case (an infinite index). */
  afterIndex: number | null;
}

export interface ProcedureInsight {
  diagnoses: number;
  findings: { checkId: string; count: number }[];
  edges: EdgeCount[];
  checks: CheckInsight[];
  medianDiagnosisMs: number | null;
  expected: Expectation | null;
  suggestion: OrderSuggestion | null;
}

export function median(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  const sorted = [...values].sort((a, b) => a - b);
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

const mean = (values: readonly number[]) => values.reduce((a, b) => a + b, 0) / values.length;

export function procedureInsight(document: ProcedureDocument, diagnoses: readonly InsightDiagnosis[]): ProcedureInsight {
  const isFinding = new Set(document.checks.filter((c) => c.kind === 'finding').map((c) => c.id));
  const findingCounts = new Map<string, number>();
  const edgeCounts = new Map<string, EdgeCount>();
  const visits = new Map<string, { times: number[]; positions: number[]; decided: number }>();
  const durations: number[] = [];

  for (const d of diagnoses) {
    if (d.findingCheckId) findingCounts.set(d.findingCheckId, (findingCounts.get(d.findingCheckId) ?? 0) + 1);
    if (d.endedAt) durations.push(Date.parse(d.endedAt) - Date.parse(d.startedAt));
    let previous = Date.parse(d.startedAt);
    let position = 0;
    let carried = 0;
    for (const s of d.steps) {
      const at = Date.parse(s.recordedAt);
      const spent = Math.max(0, at - previous) + carried;
      previous = at;
      carried = 0;
      if (s.retracted || s.nextCheckId === null) {
        carried = spent;
        continue;
      }
      position += 1;
      const key = `${s.checkId}\u0000${s.nextCheckId}`;
      const edge = edgeCounts.get(key) ?? { from: s.checkId, to: s.nextCheckId, count: 0 };
      edge.count += 1;
      edgeCounts.set(key, edge);
      const v = visits.get(s.checkId) ?? { times: [], positions: [], decided: 0 };
      v.times.push(spent);
      v.positions.push(position);
      if (isFinding.has(s.nextCheckId)) v.decided += 1;
      visits.set(s.checkId, v);
    }
  }

  const checks: CheckInsight[] = [...visits].map(([checkId, v]) => ({
    checkId,
    visits: v.times.length,
    medianMs: median(v.times)!,
    meanMs: mean(v.times),
    decides: v.decided / v.times.length,
    meanPosition: mean(v.positions),
  }));
  const edges = [...edgeCounts.values()];
  return {
    diagnoses: diagnoses.length,
    findings: [...findingCounts].map(([checkId, count]) => ({ checkId, count })).sort((a, b) => b.count - a.count),
    edges,
    checks,
    medianDiagnosisMs: median(durations),
    expected: expectedToFinding(document, edges, new Map(checks.map((c) => [c.checkId, c.meanMs]))),
    suggestion: orderSuggestion(checks),
  };
}

/** Augmented chains larger than this are not solved (the elimination is cubic); the expectation is left out. */
const MAX_STATES = 1500;

/**
 * Expected checks and time from the start to a finding, treating the observed branch frequencies as the
 * probabilities of a Markov chain whose absorbing states are the checks with no observed way on (the
 * findings): N(s) = 1 + Σ p(s→u)·N(u) and T(s) = t(s) + Σ p(s→u)·T(u), solved exactly, so loops count as
 * often as they happened. A re-test check runs at most `maxVisits` times; after that a step that would enter
 * it goes to its `whenExhausted` check, as the engine walks it. So each state is a check together with how
 * often each capped check on an observed loop has run so far, and a loop's probability only applies while
 * it may still be taken. An observed step to a `whenExhausted` check that is not one of the check's own
 * exits was a step into the exhausted re-test check, and is counted as that. Null when the first check
 * never ran, or when the loops make too many states to solve.
 */
export function expectedToFinding(document: ProcedureDocument, edges: readonly EdgeCount[], meanMs: ReadonlyMap<string, number>): Expectation | null {
  const byId = new Map(document.checks.map((c) => [c.id, c]));
  const out = new Map<string, Map<string, number>>();
  for (const e of edges) {
    const to = intendedTarget(byId.get(e.from), e.to, byId);
    const leaving = out.get(e.from) ?? new Map<string, number>();
    leaving.set(to, (leaving.get(to) ?? 0) + e.count);
    out.set(e.from, leaving);
  }
  const start = document.startCheckId;
  if (!out.has(start)) return null;

  // Only a re-test check on an observed loop can be entered again, so only those need their visits counted.
  const capped = [...out.keys()].filter((id) => {
    const c = byId.get(id);
    return c && c.kind !== 'finding' && c.retest && onLoop(id, out);
  });
  const cap = (id: string) => {
    const c = byId.get(id);
    return c && c.kind !== 'finding' && c.retest ? c.retest : undefined;
  };
  const enter = (id: string, counts: readonly number[]) => {
    const k = capped.indexOf(id);
    if (k < 0) return counts;
    const next = [...counts];
    next[k] = Math.min(next[k] + 1, cap(id)!.maxVisits);
    return next;
  };

  interface State {
    checkId: string;
    counts: readonly number[];
  }
  const keyOf = (s: State) => `${s.checkId}\u0000${s.counts.join(',')}`;
  const first: State = { checkId: start, counts: enter(start, capped.map(() => 0)) };
  const states: State[] = [first];
  const index = new Map([[keyOf(first), 0]]);
  const moves: { to: number; p: number }[][] = [];
  for (let i = 0; i < states.length; i++) {
    if (states.length > MAX_STATES) return null;
    const { checkId, counts } = states[i];
    const leaving = out.get(checkId)!;
    const total = [...leaving.values()].reduce((a, b) => a + b, 0);
    const row: { to: number; p: number }[] = [];
    for (const [target, count] of leaving) {
      const k = capped.indexOf(target);
      const to = k >= 0 && counts[k] >= cap(target)!.maxVisits ? cap(target)!.whenExhausted : target;
      if (!out.has(to)) continue; // a finding, or a check never seen to lead on: absorbing
      const next: State = { checkId: to, counts: enter(to, counts) };
      let j = index.get(keyOf(next));
      if (j === undefined) {
        j = states.length;
        states.push(next);
        index.set(keyOf(next), j);
      }
      row.push({ to: j, p: count / total });
    }
    moves.push(row);
  }

  // (I − P) x = b, one row per transient state; two right-hand sides: counts and times.
  const n = states.length;
  const a = states.map(() => new Array<number>(n).fill(0));
  const b = states.map((s) => [1, meanMs.get(s.checkId) ?? 0]);
  for (let i = 0; i < n; i++) {
    a[i][i] += 1;
    for (const m of moves[i]) a[i][m.to] -= m.p;
  }
  const [checks, ms] = solve(a, b)[0];
  return { checks, ms };
}

/** The check a step meant to enter: a step to a `whenExhausted` check the check has no exit to entered the exhausted re-test check. */
function intendedTarget(from: Check | undefined, to: string, byId: ReadonlyMap<string, Check>): string {
  if (!from) return to;
  const exits = exitsOf(from);
  if (exits.includes(to)) return to;
  const redirected = exits.find((x) => {
    const c = byId.get(x);
    return c && c.kind !== 'finding' && c.retest?.whenExhausted === to;
  });
  return redirected ?? to;
}

function exitsOf(c: Check): string[] {
  switch (c.kind) {
    case 'measure':
      return Object.values(c.outcomes).filter((x): x is string => x !== undefined);
    case 'observe':
      return c.choices.map((x) => x.next);
    case 'task':
      return [c.next];
    case 'finding':
      return [];
  }
}

/** Whether some observed path leads from `id` back to itself. */
function onLoop(id: string, out: ReadonlyMap<string, ReadonlyMap<string, number>>): boolean {
  const seen = new Set<string>();
  const stack = [...(out.get(id)?.keys() ?? [])];
  while (stack.length) {
    const at = stack.pop()!;
    if (at === id) return true;
    if (seen.has(at)) continue;
    seen.add(at);
    stack.push(...(out.get(at)?.keys() ?? []));
  }
  return false;
}

/** Gauss–Jordan elimination with partial pivoting; `a` is non-singular because every state reaches a finding. */
function solve(a: number[][], b: number[][]): number[][] {
  const n = a.length;
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[r][col]) > Math.abs(a[pivot][col])) pivot = r;
    [a[col], a[pivot]] = [a[pivot], a[col]];
    [b[col], b[pivot]] = [b[pivot], b[col]];
    for (let r = 0; r < n; r++) {
      if (r === col || a[r][col] === 0) continue;
      const f = a[r][col] / a[col][col];
      for (let k = col; k < n; k++) a[r][k] -= f * a[col][k];
      for (let k = 0; k < b[r].length; k++) b[r][k] -= f * b[col][k];
    }
  }
  return b.map((row, i) => row.map((v) => v / a[i][i]));
}

/** A check needs this many visits before its numbers say anything. */
const MIN_VISITS = 2;

/**
 * The sequential-testing rule (Mitten, 1960): checking in increasing order of cost / probability of
 * deciding minimises the expected cost. Flags the check with the best (lowest) index that runs at least one
 * step later on average than a check with a worse index, named beside the worst such earlier check.
 */
export function orderSuggestion(checks: readonly CheckInsight[]): OrderSuggestion | null {
  const rated = checks.filter((c) => c.visits >= MIN_VISITS).map((c) => ({ c, index: c.decides > 0 ? c.meanMs / c.decides : Infinity }));
  let best: OrderSuggestion | null = null;
  for (const late of [...rated].sort((x, y) => x.index - y.index)) {
    if (late.index === Infinity) break;
    const earlier = rated
      .filter((e) => e.c.meanPosition + 1 <= late.c.meanPosition && e.index > late.index)
      .sort((x, y) => y.index - x.index || x.c.meanPosition - y.c.meanPosition);
    if (earlier.length === 0) continue;
    best = { checkId: late.c.checkId, afterCheckId: earlier[0].c.checkId, index: late.index, afterIndex: Number.isFinite(earlier[0].index) ? earlier[0].index : null };
    break;
  }
  return best;
}
