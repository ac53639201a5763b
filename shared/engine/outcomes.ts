import type { MarginalPolicy, MeasureCheck, ProcedureDocument } from './procedure';
import { QUANTITY_INFO } from './quantity';
import type { Verdict } from './verdict';

/** The check's own policy, else the procedure's, else `fail` (guarded acceptance: only a clear pass passes). */
export function marginalPolicyOf(check: MeasureCheck, document: Pick<ProcedureDocument, 'marginalPolicy'>): MarginalPolicy {
  return check.marginalPolicy ?? document.marginalPolicy ?? 'fail';
}

/**
 * Verdicts `evaluate` can return for this check that need an outcome. `marginal` needs one only under the
 * `branch` policy (otherwise it is folded into in_spec/low/high). `no_reading` never needs one: a check
 * without that outcome simply doesn't offer "couldn't measure".
 */
export function requiredVerdicts(check: MeasureCheck, policy: MarginalPolicy): Verdict[] {
  const opens = QUANTITY_INFO[check.quantity].opensOnOverRange;
  const spec = check.spec;
  const verdicts: Verdict[] = ['in_spec'];
  switch (spec.kind) {
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
      if (spec.openAbove === undefined) return verdicts; // any finite reading is plainly low
      break;
    case 'ratio':
      verdicts.push('low', 'open');
      break;
    case 'record_only':
      return verdicts;
  }
  if (policy === 'branch') verdicts.push('marginal');
  return verdicts;
}
