/**
 * What the engine concludes about one reading. `marginal`: so close to a limit that the meter's own
 * uncertainty could flip the call. `open`: over range where that means an open circuit (resistance, diode).
 * `no_reading`: nothing to judge (no reading, or the earlier reading a spec compares with is missing).
 */
export const VERDICTS = ['in_spec', 'low', 'high', 'open', 'marginal', 'no_reading'] as const;
export type Verdict = (typeof VERDICTS)[number];
