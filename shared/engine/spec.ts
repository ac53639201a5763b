import type { UnitSymbol } from './quantity';
import type { WireRun } from './wire';

/**
 * What a reading must satisfy. Every number is in SI units of the check's quantity (Ω, V, A, Hz, °C);
 * `unit`, when present, states that unit so a spec copied onto a check of another quantity is caught.
 * `copperAt20C` marks limits quoted for a copper winding at 20 °C, to be corrected to the ambient temperature.
 */
export type Spec =
  | WindowSpec
  | NominalSpec
  | AtMostSpec
  | AtLeastSpec
  | ExpectOpenSpec
  | ExpectContinuitySpec
  | RecordOnlySpec
  | RatioSpec
  | AgreeWithSpec;

export type SpecKind = Spec['kind'];

export interface WindowSpec {
  kind: 'window';
  min: number;
  max: number;
  unit?: UnitSymbol;
  copperAt20C?: boolean;
}

/** nominal ± tolerance; exactly one of tolPct (percent of nominal) or tolAbs (SI units). */
export interface NominalSpec {
  kind: 'nominal';
  nominal: number;
  tolPct?: number;
  tolAbs?: number;
  unit?: UnitSymbol;
  copperAt20C?: boolean;
}

export interface AtMostSpec {
  kind: 'at_most';
  max: number;
  unit?: UnitSymbol;
  copperAt20C?: boolean;
}

export interface AtLeastSpec {
  kind: 'at_least';
  min: number;
  unit?: UnitSymbol;
  copperAt20C?: boolean;
}

/** Over range (open circuit) expected; a finite reading at or above `openAbove` also counts as open. */
export interface ExpectOpenSpec {
  kind: 'expect_open';
  openAbove?: number;
  unit?: UnitSymbol;
}

/** A continuous path: the reading must be at most `max`. */
export interface ExpectContinuitySpec {
  kind: 'expect_continuity';
  max: number;
  unit?: UnitSymbol;
}

/** The value is kept for the record and judged by nobody. */
export interface RecordOnlySpec {
  kind: 'record_only';
}

/**
 * A reading taken both ways (a diode or interlock): this check's reading is the reverse (high) one and
 * `pairWith` names the check holding the forward (low) one. reverse / forward must be at least `minRatio`;
 * over range on the reverse side passes.
 */
export interface RatioSpec {
  kind: 'ratio';
  pairWith: string;
  minRatio: number;
}

/**
 * The reading must match an earlier reading in the same diagnosis (e.g. the far end of a harness against
 * the near end), plus the resistance of `wire` on a resistance check, within exactly one of tolAbs / tolPct
 * (percent of the expected value).
 */
export interface AgreeWithSpec {
  kind: 'agree_with';
  checkId: string;
  tolAbs?: number;
  tolPct?: number;
  unit?: UnitSymbol;
  wire?: WireRun;
}

export const SPEC_KINDS = [
  'window',
  'nominal',
  'at_most',
  'at_least',
  'expect_open',
  'expect_continuity',
  'record_only',
  'ratio',
  'agree_with',
] as const satisfies readonly SpecKind[];

/** The check whose earlier reading this spec compares against, if any. */
export function referencedCheckId(spec: Spec): string | null {
  if (spec.kind === 'ratio') return spec.pairWith;
  if (spec.kind === 'agree_with') return spec.checkId;
  return null;
}
