import type { MeterFunction, Quantity } from './quantity';
import type { Spec } from './spec';
import type { Verdict } from './verdict';

/**
 * The stored form of a procedure version: plain JSON, checked by `procedureDocumentSchema` on the way in and
 * by `validateProcedure` before publishing.
 */
export interface ProcedureDocument {
  startCheckId: string;
  /** Shown once at the start of every diagnosis (battery gases, ignition voltage, moving parts…). */
  cautions: string[];
  /** How a marginal reading is treated where a check does not say; `fail` when neither says. */
  marginalPolicy?: MarginalPolicy;
  checks: Check[];
}

export type Check = MeasureCheck | ObserveCheck | TaskCheck | FindingCheck;
export type CheckKind = Check['kind'];
export const CHECK_KINDS = ['measure', 'observe', 'task', 'finding'] as const satisfies readonly CheckKind[];

/**
 * `branch`: follow the check's own `marginal` outcome (e.g. "re-seat the probes and measure again");
 * `pass`: treat as in spec; `fail`: treat as the side it leans to (low or high) — guarded acceptance.
 */
export type MarginalPolicy = 'branch' | 'pass' | 'fail';
export const MARGINAL_POLICIES = ['branch', 'pass', 'fail'] as const satisfies readonly MarginalPolicy[];

interface CheckBase {
  /** Stable within a procedure; outcomes and specs refer to checks by id. */
  id: string;
  title: string;
  instruction: string;
  probe?: Probe;
  cautions?: string[];
  pictures?: Picture[];
}

/** Where the leads go. */
export interface Probe {
  connector?: string;
  pins?: string[];
  wireColours?: string[];
}

export interface Picture {
  /** The id of a picture uploaded to the shop (see shared/procedures/pictures.ts). */
  src: string;
  /** What the picture shows, read aloud to those who can't see it. */
  alt: string;
}

/**
 * Marks a check a loop may return to (e.g. "re-seat the connector, measure again"). It runs at most
 * `maxVisits` times in one diagnosis; any step that would enter it again goes to `whenExhausted` instead.
 */
export interface Retest {
  maxVisits: number;
  whenExhausted: string;
}

/** Next check for each verdict a measure check can produce. */
export type Outcomes = Partial<Record<Verdict, string>>;

export interface MeasureCheck extends CheckBase {
  kind: 'measure';
  quantity: Quantity;
  meterFunction?: MeterFunction;
  /** Full scale of the meter range to use, in SI units; absent means autorange. */
  range?: number;
  spec: Spec;
  outcomes: Outcomes;
  marginalPolicy?: MarginalPolicy;
  retest?: Retest;
}

export interface Choice {
  id: string;
  label: string;
  next: string;
}

/** Pick one of a few stated observations ("tester flashes" / "no flash"). */
export interface ObserveCheck extends CheckBase {
  kind: 'observe';
  choices: Choice[];
  retest?: Retest;
}

/** Do something without a reading (unplug, repair, swap), then go on. */
export interface TaskCheck extends CheckBase {
  kind: 'task';
  next: string;
  retest?: Retest;
}

/** Terminal: the faulty part or cause and what to do about it. */
export interface FindingCheck extends CheckBase {
  kind: 'finding';
  finding: { part: string; action: string };
}
