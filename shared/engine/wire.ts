import { COPPER_RESISTIVITY_20, copperFactor } from './copper';

/** A wire size as the diagram gives it: American Wire Gauge number or metric cross-section in mm². */
export interface WireGauge {
  system: 'awg' | 'mm2';
  size: number;
}

/** A stretch of harness: its gauge and the total conductor length in metres (out and back for a loop). */
export interface WireRun {
  gauge: WireGauge;
  lengthM: number;
}

/** AWG sizes from 4/0 (written -3) to 40 cover every vehicle harness and winding. */
export const AWG_MIN = -3;
export const AWG_MAX = 40;

/** Solid-conductor diameter in mm for gauge n (ASTM B258): d = 0.127 mm · 92^((36 − n)/39). */
export function awgDiameterMm(n: number): number {
  return 0.127 * 92 ** ((36 - n) / 39);
}

/** Conductor cross-section in mm². A metric size is taken at its nominal area. */
export function gaugeAreaMm2(gauge: WireGauge): number {
  if (gauge.system === 'mm2') return gauge.size;
  const d = awgDiameterMm(gauge.size);
  return (Math.PI / 4) * d * d;
}

/** Resistance in Ω of a copper run at `temperatureC` (default 20 °C): ρ20·L/A corrected for temperature. */
export function wireResistance(run: WireRun, temperatureC = 20): number {
  return ((COPPER_RESISTIVITY_20 * run.lengthM) / gaugeAreaMm2(run.gauge)) * copperFactor(temperatureC);
}

export function isValidGauge(gauge: WireGauge): boolean {
  if (gauge.system === 'awg') return Number.isInteger(gauge.size) && gauge.size >= AWG_MIN && gauge.size <= AWG_MAX;
  return Number.isFinite(gauge.size) && gauge.size > 0;
}
