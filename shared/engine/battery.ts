/**
 * Rested open-circuit voltage → state of charge for a 12 V flooded lead-acid battery at 26.7 °C
 * (Battery Council International table). AGM and gel batteries sit higher and are not covered; the
 * battery must have rested (about 8 h, no charge or load) for the voltage to mean anything.
 */
export const BCI_OCV_TABLE: readonly (readonly [volts: number, percent: number])[] = [
  [11.89, 0],
  [12.06, 25],
  [12.24, 50],
  [12.45, 75],
  [12.65, 100],
];

/** State of charge in percent, linear between table points, clamped to 0–100. */
export function stateOfCharge(restedVolts: number): number {
  const first = BCI_OCV_TABLE[0];
  const last = BCI_OCV_TABLE[BCI_OCV_TABLE.length - 1];
  if (!(restedVolts > first[0])) return first[1];
  if (restedVolts >= last[0]) return last[1];
  for (let i = 1; i < BCI_OCV_TABLE.length; i++) {
    const [v1, p1] = BCI_OCV_TABLE[i];
    if (restedVolts <= v1) {
      const [v0, p0] = BCI_OCV_TABLE[i - 1];
      return p0 + ((restedVolts - v0) / (v1 - v0)) * (p1 - p0);
    }
  }
  return last[1];
}
