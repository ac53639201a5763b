import type { ProcedureDocument } from '@shared/engine/procedure';

/**
 * A small procedure for API tests. Values are invented for the test, not from
 * any manual: a pickup coil window of 400–500 Ω at 20 °C, a diode read both ways.
 */
export function fixtureProcedure(): ProcedureDocument {
  return {
    startCheckId: 'coil',
    cautions: ['Ignition off before unplugging the control unit.'],
    checks: [
      {
        id: 'coil',
        kind: 'measure',
        title: 'Pickup coil resistance',
        instruction: 'Unplug the pickup connector and measure across its two pins.',
        probe: { connector: 'P1', pins: ['1', '2'], wireColours: ['BL/Y', 'G/W'] },
        quantity: 'resistance',
        meterFunction: 'ohms',
        spec: { kind: 'window', min: 400, max: 500, unit: 'Ω', copperAt20C: true },
        outcomes: { in_spec: 'spark', low: 'coil-shorted', high: 'coil-open', open: 'coil-open' },
      },
      {
        id: 'spark',
        kind: 'observe',
        title: 'Spark at the tester',
        instruction: 'Crank in short bursts with the spark tester on lead 1.',
        cautions: ['Tens of kilovolts: use the spark tester, never hold a lead.'],
        choices: [
          { id: 'flash', label: 'Tester flashes', next: 'ok' },
          { id: 'none', label: 'No flash', next: 'unplug' },
        ],
      },
      { id: 'unplug', kind: 'task', title: 'Unplug the interlock diode', instruction: 'Pull the diode from its socket.', next: 'diode-fwd' },
      {
        id: 'diode-fwd',
        kind: 'measure',
        title: 'Diode forward',
        instruction: 'Diode test, red on the anode.',
        quantity: 'diode',
        meterFunction: 'diode',
        spec: { kind: 'window', min: 0.4, max: 0.8, unit: 'V' },
        outcomes: { in_spec: 'diode-rev', low: 'diode-bad', high: 'diode-bad', open: 'diode-bad' },
      },
      {
        id: 'diode-rev',
        kind: 'measure',
        title: 'Diode reverse',
        instruction: 'Swap the leads.',
        quantity: 'diode',
        meterFunction: 'diode',
        spec: { kind: 'ratio', pairWith: 'diode-fwd', minRatio: 10 },
        outcomes: { in_spec: 'ok', low: 'diode-bad', open: 'diode-bad' },
      },
      { id: 'coil-shorted', kind: 'finding', title: 'Pickup coil shorted', instruction: '', finding: { part: 'Pickup coil', action: 'Replace the pickup coil.' } },
      { id: 'coil-open', kind: 'finding', title: 'Pickup coil open', instruction: '', finding: { part: 'Pickup coil', action: 'Repair the lead or replace the coil.' } },
      { id: 'diode-bad', kind: 'finding', title: 'Interlock diode failed', instruction: '', finding: { part: 'Interlock diode', action: 'Replace the diode.' } },
      { id: 'ok', kind: 'finding', title: 'Ignition circuit proven', instruction: '', finding: { part: 'None', action: 'Look at fuel and compression.' } },
    ],
  };
}

/** A 6000-count meter, accuracy figures invented for tests. */
export const FIXTURE_METER = {
  name: 'Test meter',
  model: 'TM-6000',
  ranges: [
    { function: 'ohms', rangeMax: 600, resolution: 0.1, pctOfReading: 0.8, counts: 3 },
    { function: 'ohms', rangeMax: 6000, resolution: 1, pctOfReading: 0.8, counts: 2 },
    { function: 'diode', rangeMax: 3, resolution: 0.001, pctOfReading: 1.5, counts: 3 },
    { function: 'dc_volts', rangeMax: 60, resolution: 0.01, pctOfReading: 0.5, counts: 2 },
  ],
};
