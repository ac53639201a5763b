import type { MarginalPolicy, MeasureCheck, ProcedureDocument } from './procedure';
import { QUANTITY_INFO } from './quantity';
import type { SpecKind } from './spec';
import type { Verdict } from './verdict';

/** The check's own policy, else the procedure's, else `fail` (guarded acceptance: only a clear pass passes). */
export function marginalPolicyOf(check: MeasureCheck, document: Pick<ProcedureDocument, 'marginalPolicy'>): MarginalPolicy {
  return check.marginalPolicy ?? document.marginalPolicy ?? 'fail';
}

/**
 * Verdicts `evaluate` can return for this check that need an outcome. `marginal` needs one only under the
 * `branch` policy (otherwise it is folded into in_spec/low/high). `no_reading` never needs one: a check
 * without that outcome simply doesn't offer "couldn't measure". The lists are shared; don't modify them.
 */
export function requiredVerdicts(check: MeasureCheck, policy: MarginalPolicy): readonly Verdict[] {
  const spec = check.spec;
  const opens = QUANTITY_INFO[check.quantity].opensOnOverRange;
  const thresholdOpen = spec.kind === 'expect_open' && spec.openAbove !== undefined;
  return REQUIRED[spec.kind][(opens ? 4 : 0) + (policy === 'branch' ? 2 : 0) + (thresholdOpen ? 1 : 0)];
}

/** Every combination worked out once, so validating thousands of checks allocates nothing here. */
const REQUIRED: Record<SpecKind, readonly (readonly Verdict[])[]> = {
  window: combinations('window'),
  nominal: combinations('nominal'),
  at_most: combinations('at_most'),
  at_least: combinations('at_least'),
  expect_open: combinations('expect_open'),
  expect_continuity: combinations('expect_continuity'),
  record_only: combinations('record_only'),
  ratio: combinations('ratio'),
  agree_with: combinations('agree_with'),
};

function combinations(kind: SpecKind): Verdict[][] {
  return Array.from({ length: 8 }, (_, bits) => verdictsFor(kind, (bits & 4) !== 0, (bits & 2) !== 0, (bits & 1) !== 0));
}

function verdictsFor(kind: SpecKind, opens: boolean, branch: boolean, thresholdOpen: boolean): Verdict[] {
  const verdicts: Verdict[] = ['in_spec'];
  switch (kind) {
    case 'window':
    case 'nominal':
    case 'agree_with':
      verdicts.push('low', 'high');
      if (opens) verdicts.push('open');
      break;
    case 'at_most':
    case 'expect_continuity':
      verdicts.push('high');
      if (opens) verdicts.push('open');
      break;
    case 'at_least':
      verdicts.push('low');
      break;
    case 'expect_open':
      verdicts.push('low');
      if (!thresholdOpen) return verdicts; // any finite reading is plainly low, never marginal
      break;
    case 'ratio':
      verdicts.push('low', 'open');
      break;
    case 'record_only':
      return verdicts;
  }
  if (branch) verdicts.push('marginal');
  return verdicts;
}
