import type {
  Check,
  FindingCheck,
  MeasureCheck,
  ObserveCheck,
  ProcedureDocument,
  TaskCheck,
} from '@shared/engine/procedure';
import { QUANTITY_INFO, type Quantity } from '@shared/engine/quantity';
import type { Spec } from '@shared/engine/spec';
import { seededRandom } from '@shared/random/seeded-random';

/**
 * Well-formed random procedures for property tests and the validation benchmark. Checks are created in
 * order and every edge points forward, except re-test loops (a task sends the walk back to the measure
 * check that led to it, which is marked as a re-test leaving to a later finding). So the result is a DAG
 * apart from limited loops; every check is reachable (each is attached to an open outcome of an earlier
 * one); the last check is a finding; and ratio/agree_with specs only refer to their check's sole
 * predecessor, which therefore lies on every path to it.
 */
export interface GenerateOptions {
  checks: number;
  seed: number;
  /** Include re-test loops (default true). */
  loops?: boolean;
}

/** An outcome not yet pointed anywhere: `assign` sets its target. */
interface Slot {
  owner: number;
  assign: (target: string) => void;
}

const OUTCOME_KEYS = ['in_spec', 'low', 'high', 'open', 'marginal'] as const;
const PLAIN_QUANTITIES: Quantity[] = ['resistance', 'voltage_dc', 'voltage_ac', 'current_dc', 'frequency', 'diode', 'continuity'];

export function generateProcedure({ checks: count, seed, loops = true }: GenerateOptions): ProcedureDocument {
  if (count < 2) throw new Error('A generated procedure has at least 2 checks.');
  const random = seededRandom(seed);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(random() * items.length)];
  const id = (i: number) => `c${i}`;

  const checks: Check[] = [];
  const pending: Slot[] = [];
  const findingIndexes: number[] = [];
  /** Whether later outcomes may also lead into a check (false for those whose spec relies on a sole predecessor). */
  const mergeable: boolean[] = [];
  /** Measure checks a re-test loop returns to; marked as re-tests once later findings exist. */
  const loopHeads = new Set<MeasureCheck>();

  const takeSlot = (): Slot => {
    const k = Math.floor(random() * pending.length);
    const slot = pending[k];
    pending[k] = pending[pending.length - 1];
    pending.pop();
    return slot;
  };

  for (let i = 0; i < count; i++) {
    const incoming = i === 0 ? null : takeSlot();
    incoming?.assign(id(i));
    const creator = incoming === null ? null : checks[incoming.owner];
    const last = i === count - 1;
    // Keep at least one open outcome until the end, so every later check can be attached.
    const mustBranch = !last && pending.length === 0;
    const roll = random();
    const base = { id: id(i), title: `Check ${i}`, instruction: `Instruction for check ${i}.` };

    if (last || (!mustBranch && roll < 0.25)) {
      const finding: FindingCheck = { ...base, kind: 'finding', finding: { part: `Part ${i}`, action: 'Replace and prove the fix.' } };
      checks.push(finding);
      findingIndexes.push(i);
      mergeable.push(true);
      continue;
    }
    if (loops && !mustBranch && roll < 0.3 && creator?.kind === 'measure') {
      // A re-test loop: re-seat the probes and go back to the measure check, which allows two visits.
      const task: TaskCheck = { ...base, kind: 'task', title: `Re-seat probes ${i}`, next: creator.id };
      checks.push(task);
      mergeable.push(false);
      loopHeads.add(creator);
      continue;
    }
    if (roll < 0.45) {
      const choices = Array.from({ length: 2 + Math.floor(random() * 2) }, (_, k) => ({ id: `o${k}`, label: `Observation ${k}`, next: '' }));
      const observe: ObserveCheck = { ...base, kind: 'observe', choices };
      checks.push(observe);
      mergeable.push(true);
      for (const choice of choices) pending.push({ owner: i, assign: (t) => (choice.next = t) });
      continue;
    }
    if (roll < 0.55) {
      const task: TaskCheck = { ...base, kind: 'task', next: '' };
      checks.push(task);
      mergeable.push(true);
      pending.push({ owner: i, assign: (t) => (task.next = t) });
      continue;
    }
    const { quantity, spec, refersToCreator } = measureSpec(random, pick, creator?.kind === 'measure' ? creator : null);
    const measure: MeasureCheck = {
      ...base,
      kind: 'measure',
      quantity,
      meterFunction: QUANTITY_INFO[quantity].meterFunctions[0],
      spec,
      outcomes: {},
      marginalPolicy: pick(['branch', 'pass', 'fail'] as const),
    };
    checks.push(measure);
    mergeable.push(!refersToCreator);
    for (const key of OUTCOME_KEYS) pending.push({ owner: i, assign: (t) => (measure.outcomes[key] = t) });
  }

  // Outcomes still open go forward: mostly to a later finding, sometimes merging into a later check.
  const firstFindingAfter = (j: number) => {
    let lo = 0;
    let hi = findingIndexes.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (findingIndexes[mid] > j) hi = mid;
      else lo = mid + 1;
    }
    return lo;
  };
  const laterFinding = (j: number) => {
    const from = firstFindingAfter(j);
    return findingIndexes[from + Math.floor(random() * (findingIndexes.length - from))];
  };
  for (const slot of pending) {
    const k = slot.owner + 1 + Math.floor(random() * (count - slot.owner - 1));
    const target = random() < 0.2 && checks[k].kind !== 'finding' && mergeable[k] ? k : laterFinding(slot.owner);
    slot.assign(id(target));
  }
  for (const measure of loopHeads) {
    measure.retest = { maxVisits: 2, whenExhausted: id(laterFinding(Number(measure.id.slice(1)))) };
  }

  return { startCheckId: id(0), cautions: ['Remove power before resistance or diode tests.'], marginalPolicy: 'fail', checks };
}

function measureSpec(
  random: () => number,
  pick: <T>(items: readonly T[]) => T,
  creator: MeasureCheck | null,
): { quantity: Quantity; spec: Spec; refersToCreator: boolean } {
  const scale = 10 ** (Math.floor(random() * 5) - 1);
  const low = Math.round((1 + random() * 9) * 100) / 100;
  const high = low * (1.1 + random());
  if (creator !== null && random() < 0.3) {
    const quantity = creator.quantity;
    if (QUANTITY_INFO[quantity].opensOnOverRange && random() < 0.5) {
      return { quantity, spec: { kind: 'ratio', pairWith: creator.id, minRatio: 5 + Math.floor(random() * 50) }, refersToCreator: true };
    }
    const wire = quantity === 'resistance' && random() < 0.5 ? { gauge: { system: 'awg' as const, size: pick([14, 16, 18, 20, 22]) }, lengthM: 0.5 + random() * 3 } : undefined;
    return { quantity, spec: { kind: 'agree_with', checkId: creator.id, tolAbs: 0.05 * scale, wire }, refersToCreator: true };
  }
  const quantity = pick(PLAIN_QUANTITIES);
  const info = QUANTITY_INFO[quantity];
  const unit = random() < 0.5 ? info.symbol : undefined;
  const copperAt20C = info.dimension === 'resistance' && random() < 0.3 ? true : undefined;
  const roll = random();
  let spec: Spec;
  if (info.opensOnOverRange && roll < 0.15) spec = { kind: 'expect_open', openAbove: random() < 0.5 ? high * scale * 100 : undefined, unit };
  else if (info.dimension === 'resistance' && roll < 0.3) spec = { kind: 'expect_continuity', max: low * scale, unit };
  else if (roll < 0.55) spec = { kind: 'window', min: low * scale, max: high * scale, unit, copperAt20C };
  else if (roll < 0.7) spec = { kind: 'nominal', nominal: low * scale, tolPct: Math.round(random() * 20), unit, copperAt20C };
  else if (roll < 0.8) spec = { kind: 'at_most', max: high * scale, unit, copperAt20C };
  else if (roll < 0.9) spec = { kind: 'at_least', min: low * scale, unit, copperAt20C };
  else spec = { kind: 'record_only' };
  return { quantity, spec, refersToCreator: false };
}
