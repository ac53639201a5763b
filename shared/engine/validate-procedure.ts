import { buildGraph, dominanceQuery, type Graph, immediateDominators, reachableFrom, stronglyConnectedComponents } from './graph';
import { marginalPolicyOf, requiredVerdicts } from './outcomes';
import type { Check, MeasureCheck, ProcedureDocument } from './procedure';
import { QUANTITIES, QUANTITY_INFO } from './quantity';
import { referencedCheckId, type Spec } from './spec';
import { IdIndex } from './id-index';
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

  const indexById = new IdIndex(n);
  const duplicate = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    if (indexById.add(checks[i].id, i) !== -1) {
      duplicate[i] = 1;
      report(checks[i].id, 'duplicate_id', `Two checks share the id “${checks[i].id}”. Give each check its own id.`);
    }
  }

  // Edges of the procedure as written, and where each re-test check sends a walk once its visits run out.
  // Typed arrays grown by doubling: a 20,000-check document is read once, not once more to count its edges.
  let from: Int32Array = new Int32Array(n * 3 + 8);
  let to: Int32Array = new Int32Array(n * 3 + 8);
  let m = 0;
  const exhaustTo = new Int32Array(n).fill(-1);
  /** Measure checks whose spec compares with an earlier reading, checked once dominators are known. */
  const referring: { i: number; check: MeasureCheck; refId: string }[] = [];
  /** Index into QUANTITIES of each measure check's quantity, -1 for other kinds: references are checked from here, not by revisiting the document. */
  const measured = new Int8Array(n).fill(-1);
  // `label` names the edge in a message: a verdict, a choice label, or '' for a task's next step.
  const follow = (check: Check, i: number, target: string, label: string) => {
    const j = indexById.get(target);
    if (j === -1) {
      const what = check.kind === 'measure' ? `The ${label.replace('_', ' ')} outcome` : check.kind === 'observe' ? `The choice “${label}”` : 'The next step';
      report(check.id, 'dangling_outcome', `${what} leads to “${target}”, which doesn't exist. Point it at an existing check or add “${target}”.`);
      return;
    }
    if (m === from.length) {
      from = grow(from);
      to = grow(to);
    }
    from[m] = i;
    to[m++] = j;
  };

  for (let i = 0; i < n; i++) {
    if (duplicate[i] === 1) continue;
    const check = checks[i];
    switch (check.kind) {
      case 'measure': {
        let present = 0;
        for (let v = 0; v < VERDICTS.length; v++) {
          const target = check.outcomes[VERDICTS[v]];
          if (target !== undefined) {
            present |= 1 << v;
            follow(check, i, target, VERDICTS[v]);
          }
        }
        checkOutcomesComplete(check, present, document, report);
        checkSpec(check, report);
        measured[i] = QUANTITIES.indexOf(check.quantity);
        const refId = referencedCheckId(check.spec);
        if (refId !== null) referring.push({ i, check, refId });
        break;
      }
      case 'observe': {
        const choices = check.choices;
        if (choices.length === 0) {
          report(check.id, 'dead_end', 'This observation has no choices, so a diagnosis stops here. Add the observations the technician can pick.');
        }
        for (let k = 0; k < choices.length; k++) {
          // A handful of choices at most (the schema caps them), so a pairwise look is cheapest.
          for (let earlier = 0; earlier < k; earlier++) {
            if (choices[earlier].id === choices[k].id) {
              report(check.id, 'duplicate_choice', `Two choices share the id “${choices[k].id}”. Give each choice its own id.`);
              break;
            }
          }
          follow(check, i, choices[k].next, choices[k].label);
        }
        break;
      }
      case 'task':
        follow(check, i, check.next, '');
        break;
      case 'finding':
        break;
    }
    if (check.kind !== 'finding' && check.retest !== undefined) {
      const { maxVisits, whenExhausted } = check.retest;
      const j = indexById.get(whenExhausted);
      if (!Number.isInteger(maxVisits) || maxVisits < 1) {
        report(check.id, 'bad_retest', `A re-test limit is a whole number of visits, 1 or more; it is ${maxVisits}.`);
      } else if (j === -1) {
        report(check.id, 'bad_retest', `After the last re-test the diagnosis goes to “${whenExhausted}”, which doesn't exist. Point it at an existing check.`);
      } else if (isRetest(checks[j])) {
        report(check.id, 'bad_retest', `After the last re-test the diagnosis must leave the loop: point “when exhausted” at a check that is not itself a re-test check.`);
      } else {
        exhaustTo[i] = j;
      }
    }
  }

  const start = indexById.get(document.startCheckId);
  if (start === -1) {
    report(document.startCheckId, 'missing_start', `The procedure starts at “${document.startCheckId}”, which doesn't exist. Pick the first check.`);
    return problems;
  }

  // `possible`: every edge a walk can take — for reachability and dominance. An exhausted re-test check is
  // skipped only after it has run maxVisits (≥ 1) times, so its exit is drawn from the re-test check itself:
  // its reading exists on every path through the exit. `settled`: edges once every re-test is exhausted; a
  // cycle there never ends.
  let exits = 0;
  for (let i = 0; i < n; i++) if (exhaustTo[i] !== -1) exits++;
  const possibleFrom = new Int32Array(m + exits);
  const possibleTo = new Int32Array(m + exits);
  possibleFrom.set(from.subarray(0, m));
  possibleTo.set(to.subarray(0, m));
  for (let i = 0, extra = m; i < n; i++) {
    if (exhaustTo[i] !== -1) {
      possibleFrom[extra] = i;
      possibleTo[extra++] = exhaustTo[i];
    }
  }
  const settledTo = to.slice(0, m);
  for (let e = 0; e < m; e++) if (exhaustTo[to[e]] !== -1) settledTo[e] = exhaustTo[to[e]];
  const possible = buildGraph(n, possibleFrom, possibleTo);

  const reached = reachableFrom(possible, start);
  for (let i = 0; i < n; i++) {
    if (reached[i] === 0 && duplicate[i] === 0) {
      report(checks[i].id, 'unreachable', 'No path from the start leads here. Point an outcome at this check or delete it.');
    }
  }

  reportCycles(buildGraph(n, from.subarray(0, m), settledTo), checks, from.subarray(0, m), to.subarray(0, m), exhaustTo, report);

  const dominates = dominanceQuery(immediateDominators(possible, start), start);
  for (const { i, check, refId } of referring) {
    const j = indexById.get(refId);
    if (j === -1) {
      report(check.id, 'bad_reference', `The spec compares with check “${refId}”, which doesn't exist. Pick the check whose reading it compares with.`);
      continue;
    }
    const refQuantity = measured[j] === -1 ? null : QUANTITIES[measured[j]];
    if (j === i) {
      report(check.id, 'bad_reference', 'The spec compares this check with itself. Pick the earlier check whose reading it compares with.');
    } else if (refQuantity === null) {
      report(check.id, 'bad_reference', `The spec compares with “${refId}”, which takes no reading. Pick a measure check.`);
    } else if (QUANTITY_INFO[refQuantity].dimension !== QUANTITY_INFO[check.quantity].dimension || (check.spec.kind === 'ratio' && refQuantity !== check.quantity)) {
      report(check.id, 'bad_reference', `The spec compares this ${QUANTITY_INFO[check.quantity].noun} reading with “${refId}”, which reads ${QUANTITY_INFO[refQuantity].noun}. Compare like with like.`);
    } else if (reached[i] === 1 && !dominates(j, i)) {
      report(check.id, 'reference_not_dominating', `Some paths reach this check without passing “${refId}”, so its reading may be missing. Compare with a check every path passes first, or move this check after it.`);
    }
  }
  return problems;
}

function grow(array: Int32Array): Int32Array {
  const larger = new Int32Array(array.length * 2);
  larger.set(array);
  return larger;
}

function isRetest(check: Check): boolean {
  return check.kind !== 'finding' && check.retest !== undefined;
}

type Report = (checkId: string, code: ProblemCode, message: string) => void;

/** `present` has bit v set when the check has an outcome for VERDICTS[v]. */
function checkOutcomesComplete(check: MeasureCheck, present: number, document: ProcedureDocument, report: Report): void {
  let missing: string[] | null = null;
  for (const verdict of requiredVerdicts(check, marginalPolicyOf(check, document))) {
    if ((present & (1 << VERDICTS.indexOf(verdict))) === 0) (missing ??= []).push(verdict.replace('_', ' '));
  }
  if (missing !== null) {
    report(check.id, 'missing_outcome', `This check can come out ${missing.join(', ')} but has no outcome for ${missing.length === 1 ? 'it' : 'them'}. Say where each leads.`);
  }
}

function checkSpec(check: MeasureCheck, report: Report): void {
  const info = QUANTITY_INFO[check.quantity];
  const spec = check.spec;
  const id = check.id;
  const quantity = check.quantity;

  if (check.meterFunction !== undefined && !info.meterFunctions.includes(check.meterFunction)) {
    report(id, 'unit_mismatch', `The meter is set to ${check.meterFunction.replace('_', ' ')} but the check reads ${info.noun}. Use ${info.meterFunctions.map((f) => f.replace('_', ' ')).join(' or ')}.`);
  }
  if ('unit' in spec && spec.unit !== undefined && spec.unit !== info.symbol) {
    report(id, 'unit_mismatch', `The spec is in ${spec.unit} but the check reads ${info.noun} (${info.symbol}). Re-enter the spec in ${info.symbol}.`);
  }
  if ('copperAt20C' in spec && spec.copperAt20C === true && info.dimension !== 'resistance') {
    report(id, 'unit_mismatch', 'Copper temperature correction only applies to resistance. Untick it for this check.');
  }

  switch (spec.kind) {
    case 'window':
      if (!(Number.isFinite(spec.min) && Number.isFinite(spec.max)) || !(spec.min < spec.max)) {
        report(id, 'bad_window', `The window runs from ${formatValue(spec.min, quantity)} to ${formatValue(spec.max, quantity)}; the minimum must be below the maximum.`);
      } else if (!info.signed && spec.min < 0) {
        report(id, 'bad_window', `A ${info.noun} reading can't be negative; start the window at 0 or above.`);
      }
      break;
    case 'nominal': {
      if (!Number.isFinite(spec.nominal)) report(id, 'bad_window', 'Enter the nominal value as a number.');
      const problem = toleranceProblem(spec.tolPct, spec.tolAbs);
      if (problem !== null) report(id, 'bad_tolerance', problem);
      break;
    }
    case 'at_most':
      if (!Number.isFinite(spec.max) || (!info.signed && spec.max <= 0)) report(id, 'bad_window', `“At most ${formatValue(spec.max, quantity)}” can never be met. Enter a maximum above 0.`);
      break;
    case 'at_least':
      if (!Number.isFinite(spec.min) || (!info.signed && spec.min < 0)) report(id, 'bad_window', `“At least ${formatValue(spec.min, quantity)}” is met by every reading. Enter a minimum of 0 or above.`);
      break;
    case 'expect_open':
      if (!info.opensOnOverRange) report(id, 'unit_mismatch', `An open circuit is read on a resistance or diode check, not ${info.noun}.`);
      if (spec.openAbove !== undefined && !(Number.isFinite(spec.openAbove) && spec.openAbove > 0)) report(id, 'bad_spec', 'The value treated as open must be above 0.');
      break;
    case 'expect_continuity':
      if (info.dimension !== 'resistance') report(id, 'unit_mismatch', `Continuity is read on a resistance or continuity check, not ${info.noun}.`);
      if (!(Number.isFinite(spec.max) && spec.max > 0)) report(id, 'bad_window', 'The continuity threshold must be above 0 Ω.');
      break;
    case 'ratio':
      if (!info.opensOnOverRange) report(id, 'unit_mismatch', `A both-ways ratio is read on a diode or resistance check, not ${info.noun}.`);
      if (!(Number.isFinite(spec.minRatio) && spec.minRatio > 1)) report(id, 'bad_spec', `The reverse/forward ratio must be more than 1; it is ${spec.minRatio}.`);
      break;
    case 'agree_with': {
      const problem = toleranceProblem(spec.tolPct, spec.tolAbs);
      if (problem !== null) report(id, 'bad_tolerance', problem);
      if (spec.wire !== undefined) {
        if (info.dimension !== 'resistance') report(id, 'unit_mismatch', 'Wire resistance only adds to a resistance reading. Remove the wire from this spec.');
        if (!isValidGauge(spec.wire.gauge)) report(id, 'bad_spec', `Wire size ${spec.wire.gauge.size} ${spec.wire.gauge.system === 'awg' ? 'AWG' : 'mm²'} doesn't exist. Enter the size from the wiring diagram.`);
        if (!(Number.isFinite(spec.wire.lengthM) && spec.wire.lengthM > 0)) report(id, 'bad_spec', 'Enter the wire length in metres, above 0.');
      }
      break;
    }
    case 'record_only':
      break;
  }

  if (check.range !== undefined) {
    const highest = highestLimit(spec);
    if (!(check.range > 0)) report(id, 'bad_spec', 'The meter range must be above 0.');
    else if (highest !== null && highest > check.range) {
      report(id, 'range_too_small', `The ${formatValue(check.range, quantity)} range can't show ${formatValue(highest, quantity)}. Pick a higher range or autorange.`);
    }
  }
}

/** Exactly one tolerance, finite and not negative. */
function toleranceProblem(tolPct: number | undefined, tolAbs: number | undefined): string | null {
  if ((tolPct === undefined) === (tolAbs === undefined)) return 'Give the tolerance either in percent or in units, not both or neither.';
  const tol = tolPct ?? tolAbs ?? 0;
  return Number.isFinite(tol) && tol >= 0 ? null : `A tolerance must be 0 or more; it is ${tol}.`;
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
function reportCycles(settled: Graph, checks: Check[], from: Int32Array, to: Int32Array, exhaustTo: Int32Array, report: Report): void {
  const n = settled.nodeCount;
  const { component, count } = stronglyConnectedComponents(settled);
  const size = new Int32Array(count);
  const selfLoop = new Uint8Array(count);
  for (let v = 0; v < n; v++) {
    size[component[v]]++;
    for (let e = settled.offsets[v]; e < settled.offsets[v + 1]; e++) if (settled.targets[e] === v) selfLoop[component[v]] = 1;
  }
  const reentered = new Uint8Array(count);
  for (let e = 0; e < from.length; e++) {
    const exit = exhaustTo[to[e]];
    if (exit !== -1 && component[exit] === component[from[e]]) reentered[component[exit]] = 1;
  }
  // Members of each looping component, in document order; well-formed documents have none.
  const loops = new Map<number, number[]>();
  for (let v = 0; v < n; v++) {
    const c = component[v];
    if (size[c] < 2 && selfLoop[c] === 0) continue;
    const members = loops.get(c);
    if (members === undefined) loops.set(c, [v]);
    else members.push(v);
  }
  for (const [c, group] of loops) {
    const first = checks[group[0]].id;
    if (group.length === 1 && reentered[c] === 0) {
      report(first, 'cycle', `“${first}” leads back to itself. Point the outcome at the next check, or add a re-test check in between.`);
      continue;
    }
    const names = group.slice(0, CYCLE_NAMES_SHOWN).map((i) => `“${checks[i].id}”`).join(', ');
    const more = group.length > CYCLE_NAMES_SHOWN ? ` and ${group.length - CYCLE_NAMES_SHOWN} more` : '';
    report(
      first,
      'cycle',
      reentered[c] === 1
        ? `The loop through ${names}${more} never ends: after the last re-test the diagnosis comes back into it. Point “when exhausted” at a check outside the loop.`
        : `Checks ${names}${more} form a loop with no limit. Mark the check the loop returns to as a re-test with a visit limit, or point an outcome forward.`,
    );
  }
}
