import { buildGraph, dominanceQuery, type Graph, immediateDominators, reachableFrom, stronglyConnectedComponents } from './graph';
import { marginalPolicyOf, requiredVerdicts } from './outcomes';
import type { Check, MeasureCheck, ProcedureDocument } from './procedure';
import { QUANTITY_INFO } from './quantity';
import { referencedCheckId, type Spec } from './spec';
import { formatValue } from './units';
import { VERDICTS } from './verdict';
import { isValidGauge } from './wire';

export type ProblemCode =
  | 'duplicate_id'
  | 'missing_start'
  | 'dangling_outcome'
  | 'missing_outcome'
  | 'dead_end'
  | 'duplicate_choice'
  | 'unreachable'
  | 'cycle'
  | 'bad_window'
  | 'bad_tolerance'
  | 'bad_spec'
  | 'unit_mismatch'
  | 'range_too_small'
  | 'bad_reference'
  | 'reference_not_dominating'
  | 'bad_retest';

/** One thing to fix before publishing; the message says what and how. */
export interface ValidationProblem {
  checkId: string;
  code: ProblemCode;
  message: string;
}

/** Cycle messages name at most this many checks. */
const CYCLE_NAMES_SHOWN = 5;

/**
 * Everything that must hold before a procedure is published: every outcome leads to an existing check,
 * every check is reachable, every path ends at a finding, loops only through re-test checks with a limit,
 * specs well formed and in the check's units, earlier-reading specs refer to a check on every path before
 * them, measure checks have an outcome for every verdict they can produce. Near-linear in the size of the
 * document. Expects a document that passed `procedureDocumentSchema`.
 */
export function validateProcedure(document: ProcedureDocument): ValidationProblem[] {
  const problems: ValidationProblem[] = [];
  const report = (checkId: string, code: ProblemCode, message: string) => problems.push({ checkId, code, message });
  const checks = document.checks;
  const n = checks.length;

  const indexById = new Map<string, number>();
  for (let i = 0; i < n; i++) {
    const id = checks[i].id;
    if (indexById.has(id)) report(id, 'duplicate_id', `Two checks share the id “${id}”. Give each check its own id.`);
    else indexById.set(id, i);
  }

  // Edges of the procedure as written, and where each re-test check sends a walk once its visits run out.
  const from: number[] = [];
  const to: number[] = [];
  const exhaustTo = new Int32Array(n).fill(-1);
  const follow = (check: Check, i: number, target: string, what: string) => {
    const j = indexById.get(target);
    if (j === undefined) {
      report(check.id, 'dangling_outcome', `${what} leads to “${target}”, which doesn't exist. Point it at an existing check or add “${target}”.`);
    } else {
      from.push(i);
      to.push(j);
    }
  };

  for (let i = 0; i < n; i++) {
    const check = checks[i];
    if (indexById.get(check.id) !== i) continue; // a duplicate; reported above
    switch (check.kind) {
      case 'measure':
        for (const verdict of VERDICTS) {
          const target = check.outcomes[verdict];
          if (target !== undefined) follow(check, i, target, `The ${verdict.replace('_', ' ')} outcome`);
        }
        checkOutcomesComplete(check, document, report);
        checkSpec(check, report);
        break;
      case 'observe': {
        if (check.choices.length === 0) {
          report(check.id, 'dead_end', 'This observation has no choices, so a diagnosis stops here. Add the observations the technician can pick.');
        }
        const seen = new Set<string>();
        for (const choice of check.choices) {
          if (seen.has(choice.id)) report(check.id, 'duplicate_choice', `Two choices share the id “${choice.id}”. Give each choice its own id.`);
          seen.add(choice.id);
          follow(check, i, choice.next, `The choice “${choice.label}”`);
        }
        break;
      }
      case 'task':
        follow(check, i, check.next, 'The next step');
        break;
      case 'finding':
        break;
    }
    if (check.kind !== 'finding' && check.retest !== undefined) {
      const { maxVisits, whenExhausted } = check.retest;
      const j = indexById.get(whenExhausted);
      if (!Number.isInteger(maxVisits) || maxVisits < 1) {
        report(check.id, 'bad_retest', `A re-test limit is a whole number of visits, 1 or more; it is ${maxVisits}.`);
      } else if (j === undefined) {
        report(check.id, 'bad_retest', `After the last re-test the diagnosis goes to “${whenExhausted}”, which doesn't exist. Point it at an existing check.`);
      } else if (isRetest(checks[j])) {
        report(check.id, 'bad_retest', `After the last re-test the diagnosis must leave the loop: point “when exhausted” at a check that is not itself a re-test check.`);
      } else {
        exhaustTo[i] = j;
      }
    }
  }

  const start = indexById.get(document.startCheckId);
  if (start === undefined) {
    report(document.startCheckId, 'missing_start', `The procedure starts at “${document.startCheckId}”, which doesn't exist. Pick the first check.`);
    return problems;
  }

  // `possible`: every edge a walk can take (as written, plus the exits of exhausted re-tests) — for reachability
  // and dominance. `settled`: edges once every re-test is exhausted; a cycle there never ends.
  const possibleFrom = from.slice();
  const possibleTo = to.slice();
  const settledTo = to.slice();
  for (let e = 0; e < from.length; e++) {
    const exit = exhaustTo[to[e]];
    if (exit !== -1) {
      possibleFrom.push(from[e]);
      possibleTo.push(exit);
      settledTo[e] = exit;
    }
  }
  const possible = buildGraph(n, possibleFrom, possibleTo);

  const reached = reachableFrom(possible, start);
  for (let i = 0; i < n; i++) {
    if (reached[i] === 0 && indexById.get(checks[i].id) === i) {
      report(checks[i].id, 'unreachable', 'No path from the start leads here. Point an outcome at this check or delete it.');
    }
  }

  reportCycles(buildGraph(n, from, settledTo), checks, from, to, exhaustTo, report);

  const dominates = dominanceQuery(immediateDominators(possible, start), start);
  for (let i = 0; i < n; i++) {
    const check = checks[i];
    if (check.kind !== 'measure' || indexById.get(check.id) !== i) continue;
    const refId = referencedCheckId(check.spec);
    if (refId === null) continue;
    const j = indexById.get(refId);
    if (j === undefined) {
      report(check.id, 'bad_reference', `The spec compares with check “${refId}”, which doesn't exist. Pick the check whose reading it compares with.`);
      continue;
    }
    const ref = checks[j];
    if (j === i) {
      report(check.id, 'bad_reference', 'The spec compares this check with itself. Pick the earlier check whose reading it compares with.');
    } else if (ref.kind !== 'measure') {
      report(check.id, 'bad_reference', `The spec compares with “${refId}”, which takes no reading. Pick a measure check.`);
    } else if (QUANTITY_INFO[ref.quantity].dimension !== QUANTITY_INFO[check.quantity].dimension || (check.spec.kind === 'ratio' && ref.quantity !== check.quantity)) {
      report(check.id, 'bad_reference', `The spec compares this ${QUANTITY_INFO[check.quantity].noun} reading with “${refId}”, which reads ${QUANTITY_INFO[ref.quantity].noun}. Compare like with like.`);
    } else if (reached[i] === 1 && !dominates(j, i)) {
      report(check.id, 'reference_not_dominating', `Some paths reach this check without passing “${refId}”, so its reading may be missing. Compare with a check every path passes first, or move this check after it.`);
    }
  }
  return problems;
}

function isRetest(check: Check): boolean {
  return check.kind !== 'finding' && check.retest !== undefined;
}

type Report = (checkId: string, code: ProblemCode, message: string) => void;

function checkOutcomesComplete(check: MeasureCheck, document: ProcedureDocument, report: Report): void {
  const missing = requiredVerdicts(check, marginalPolicyOf(check, document)).filter((v) => check.outcomes[v] === undefined);
  if (missing.length > 0) {
    const names = missing.map((v) => v.replace('_', ' ')).join(', ');
    report(check.id, 'missing_outcome', `This check can come out ${names} but has no outcome for ${missing.length === 1 ? 'it' : 'them'}. Say where each leads.`);
  }
}

function checkSpec(check: MeasureCheck, report: Report): void {
  const info = QUANTITY_INFO[check.quantity];
  const spec = check.spec;
  const bad = (code: ProblemCode, message: string) => report(check.id, code, message);
  const show = (v: number) => formatValue(v, check.quantity);

  if (check.meterFunction !== undefined && !info.meterFunctions.includes(check.meterFunction)) {
    bad('unit_mismatch', `The meter is set to ${check.meterFunction.replace('_', ' ')} but the check reads ${info.noun}. Use ${info.meterFunctions.map((f) => f.replace('_', ' ')).join(' or ')}.`);
  }
  if ('unit' in spec && spec.unit !== undefined && spec.unit !== info.symbol) {
    bad('unit_mismatch', `The spec is in ${spec.unit} but the check reads ${info.noun} (${info.symbol}). Re-enter the spec in ${info.symbol}.`);
  }
  if ('copperAt20C' in spec && spec.copperAt20C === true && info.dimension !== 'resistance') {
    bad('unit_mismatch', 'Copper temperature correction only applies to resistance. Untick it for this check.');
  }
  const finite = (...values: number[]) => values.every(Number.isFinite);
  const unsignedNegative = (v: number) => !info.signed && v < 0;

  switch (spec.kind) {
    case 'window':
      if (!finite(spec.min, spec.max) || !(spec.min < spec.max)) {
        bad('bad_window', `The window runs from ${show(spec.min)} to ${show(spec.max)}; the minimum must be below the maximum.`);
      } else if (unsignedNegative(spec.min)) {
        bad('bad_window', `A ${info.noun} reading can't be negative; start the window at 0 or above.`);
      }
      break;
    case 'nominal': {
      const tolerances = (spec.tolPct === undefined ? 0 : 1) + (spec.tolAbs === undefined ? 0 : 1);
      const tol = spec.tolPct ?? spec.tolAbs ?? 0;
      if (!finite(spec.nominal)) bad('bad_window', 'Enter the nominal value as a number.');
      if (tolerances !== 1) bad('bad_tolerance', 'Give the tolerance either in percent or in units, not both or neither.');
      else if (!finite(tol) || tol < 0) bad('bad_tolerance', `A tolerance can't be negative; it is ${tol}.`);
      break;
    }
    case 'at_most':
      if (!finite(spec.max) || (!info.signed && spec.max <= 0)) bad('bad_window', `“At most ${show(spec.max)}” can never be met. Enter a maximum above 0.`);
      break;
    case 'at_least':
      if (!finite(spec.min) || unsignedNegative(spec.min)) bad('bad_window', `“At least ${show(spec.min)}” is met by every reading. Enter a minimum of 0 or above.`);
      break;
    case 'expect_open':
      if (!info.opensOnOverRange) bad('unit_mismatch', `An open circuit is read on a resistance or diode check, not ${info.noun}.`);
      if (spec.openAbove !== undefined && !(finite(spec.openAbove) && spec.openAbove > 0)) bad('bad_spec', 'The value treated as open must be above 0.');
      break;
    case 'expect_continuity':
      if (info.dimension !== 'resistance') bad('unit_mismatch', `Continuity is read on a resistance or continuity check, not ${info.noun}.`);
      if (!(finite(spec.max) && spec.max > 0)) bad('bad_window', 'The continuity threshold must be above 0 Ω.');
      break;
    case 'ratio':
      if (!info.opensOnOverRange) bad('unit_mismatch', `A both-ways ratio is read on a diode or resistance check, not ${info.noun}.`);
      if (!(finite(spec.minRatio) && spec.minRatio > 1)) bad('bad_spec', `The reverse/forward ratio must be more than 1; it is ${spec.minRatio}.`);
      break;
    case 'agree_with': {
      const tolerances = (spec.tolPct === undefined ? 0 : 1) + (spec.tolAbs === undefined ? 0 : 1);
      const tol = spec.tolPct ?? spec.tolAbs ?? 0;
      if (tolerances !== 1) bad('bad_tolerance', 'Say how close the readings must agree: a tolerance in percent or in units, not both or neither.');
      else if (!finite(tol) || tol < 0) bad('bad_tolerance', `A tolerance can't be negative; it is ${tol}.`);
      if (spec.wire !== undefined) {
        if (info.dimension !== 'resistance') bad('unit_mismatch', 'Wire resistance only adds to a resistance reading. Remove the wire from this spec.');
        if (!isValidGauge(spec.wire.gauge)) bad('bad_spec', `Wire size ${spec.wire.gauge.size} ${spec.wire.gauge.system === 'awg' ? 'AWG' : 'mm²'} doesn't exist. Enter the size from the wiring diagram.`);
        if (!(finite(spec.wire.lengthM) && spec.wire.lengthM > 0)) bad('bad_spec', 'Enter the wire length in metres, above 0.');
      }
      break;
    }
    case 'record_only':
      break;
  }

  if (check.range !== undefined) {
    const highest = highestLimit(spec);
    if (!(check.range > 0)) bad('bad_spec', 'The meter range must be above 0.');
    else if (highest !== null && highest > check.range) {
      bad('range_too_small', `The ${show(check.range)} range can't show ${show(highest)}. Pick a higher range or autorange.`);
    }
  }
}

/** The largest value a reading must be shown at to be judged; above the range the meter shows OL. */
function highestLimit(spec: Spec): number | null {
  switch (spec.kind) {
    case 'window':
    case 'at_most':
    case 'expect_continuity':
      return spec.max;
    case 'at_least':
      return spec.min;
    case 'nominal':
      return spec.nominal + (spec.tolPct !== undefined ? (Math.abs(spec.nominal) * spec.tolPct) / 100 : (spec.tolAbs ?? 0));
    default:
      return null;
  }
}

/**
 * Loops that survive once every re-test is used up never end. `from`/`to` are the edges as written: an edge
 * into a re-test check whose exit lies in the same loop means the exit leads straight back in.
 */
function reportCycles(settled: Graph, checks: Check[], from: number[], to: number[], exhaustTo: Int32Array, report: Report): void {
  const { component, count } = stronglyConnectedComponents(settled);
  const members: number[][] = Array.from({ length: count }, () => []);
  for (let v = 0; v < settled.nodeCount; v++) members[component[v]].push(v);
  const reentered = new Uint8Array(count);
  for (let e = 0; e < from.length; e++) {
    const exit = exhaustTo[to[e]];
    if (exit !== -1 && component[exit] === component[from[e]]) reentered[component[exit]] = 1;
  }
  for (const group of members) {
    const v = group[0]; // members are in document order
    let selfLoop = false;
    for (let e = settled.offsets[v]; e < settled.offsets[v + 1]; e++) if (settled.targets[e] === v) selfLoop = true;
    if (group.length < 2 && !selfLoop) continue;
    const names = group.slice(0, CYCLE_NAMES_SHOWN).map((i) => `“${checks[i].id}”`).join(', ');
    const more = group.length > CYCLE_NAMES_SHOWN ? ` and ${group.length - CYCLE_NAMES_SHOWN} more` : '';
    if (selfLoop && group.length === 1 && reentered[component[v]] === 0) {
      report(checks[v].id, 'cycle', `“${checks[v].id}” leads back to itself. Point the outcome at the next check, or add a re-test check in between.`);
      continue;
    }
    report(
      checks[group[0]].id,
      'cycle',
      reentered[component[v]] === 1
        ? `The loop through ${names}${more} never ends: after the last re-test the diagnosis comes back into it. Point “when exhausted” at a check outside the loop.`
        : `Checks ${names}${more} form a loop with no limit. Mark the check the loop returns to as a re-test with a visit limit, or point an outcome forward.`,
    );
  }
}
