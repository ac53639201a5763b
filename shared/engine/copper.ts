/**
 * Annealed copper per the International Annealed Copper Standard (IEC 60028): resistivity and temperature
 * coefficient at 20 °C. Handbook values for pure copper (α ≈ 0.00404) are a different constant set; wire and
 * windings in machines are annealed copper.
 */
export const COPPER_ALPHA_20 = 0.00393;
/** Ω·mm²/m at 20 °C. */
export const COPPER_RESISTIVITY_20 = 1 / 58;

/** Factor a 20 °C copper resistance is multiplied by at `temperatureC`: 1 + α·(T − 20). */
export function copperFactor(temperatureC: number): number {
  return 1 + COPPER_ALPHA_20 * (temperatureC - 20);
}

/** R_T = R_20 · (1 + α·(T − 20)). */
export function copperResistanceAt(resistanceAt20C: number, temperatureC: number): number {
  return resistanceAt20C * copperFactor(temperatureC);
}
