import type { ProcedureDocument } from '@shared/engine/procedure';

/**
 * An invented "cranks, no spark" procedure exercising every spec family the engine knows. Spec values are
 * invented demo values, not any manufacturer's.
 */
export function demoProcedure(): ProcedureDocument {
  return {
    startCheckId: 'spark',
    cautions: ['Ignition secondary voltage reaches tens of kilovolts: use a spark tester, never hold a lead.'],
    marginalPolicy: 'fail',
    checks: [
      {
        id: 'spark',
        kind: 'observe',
        title: 'Spark at the plug lead',
        instruction: 'Fit the spark tester to the plug lead and crank in short bursts.',
        cautions: ['No spark test near fuel vapour.'],
        choices: [
          { id: 'flash', label: 'Tester flashes', next: 'f-fuel' },
          { id: 'none', label: 'No flash', next: 'battery' },
        ],
      },
      {
        id: 'battery',
        kind: 'measure',
        title: 'Battery voltage, rested',
        instruction: 'Measure across the battery terminals.',
        probe: { connector: 'Battery', wireColours: ['red', 'black'] },
        quantity: 'voltage_dc',
        meterFunction: 'dc_volts',
        spec: { kind: 'at_least', min: 12.4, unit: 'V' },
        outcomes: { in_spec: 'ckp-ohms', low: 'f-battery' },
      },
      {
        id: 'ckp-ohms',
        kind: 'measure',
        title: 'Crank sensor coil resistance',
        instruction: 'Unplug the crank sensor and measure across its two pins.',
        probe: { connector: 'Crank sensor', pins: ['1', '2'], wireColours: ['blue/yellow', 'green'] },
        quantity: 'resistance',
        meterFunction: 'ohms',
        range: 2000,
        spec: { kind: 'window', min: 400, max: 500, unit: 'Ω', copperAt20C: true },
        marginalPolicy: 'branch',
        retest: { maxVisits: 2, whenExhausted: 'f-ckp' },
        outcomes: { in_spec: 'ckp-ecu', low: 'f-ckp', high: 'f-ckp', open: 'f-ckp', marginal: 'reseat' },
      },
      {
        id: 'reseat',
        kind: 'task',
        title: 'Clean and re-seat',
        instruction: 'Clean the sensor pins, re-seat the probes and measure again.',
        next: 'ckp-ohms',
      },
      {
        id: 'ckp-ecu',
        kind: 'measure',
        title: 'Crank sensor at the control unit',
        instruction: 'Measure the same coil from the control unit connector.',
        probe: { connector: 'Control unit', pins: ['14', '27'] },
        quantity: 'resistance',
        meterFunction: 'ohms',
        spec: { kind: 'agree_with', checkId: 'ckp-ohms', tolAbs: 5, unit: 'Ω', wire: { gauge: { system: 'mm2', size: 0.5 }, lengthM: 1.2 } },
        outcomes: { in_spec: 'diode-fwd', low: 'f-harness', high: 'f-harness', open: 'f-harness' },
      },
      {
        id: 'diode-fwd',
        kind: 'measure',
        title: 'Interlock diode, forward',
        instruction: 'Diode test: red on the anode, black on the cathode.',
        quantity: 'diode',
        meterFunction: 'diode',
        spec: { kind: 'window', min: 0.4, max: 0.8, unit: 'V' },
        outcomes: { in_spec: 'diode-rev', low: 'f-diode', high: 'f-diode', open: 'f-diode' },
      },
      {
        id: 'diode-rev',
        kind: 'measure',
        title: 'Interlock diode, reverse',
        instruction: 'Swap the leads.',
        quantity: 'diode',
        meterFunction: 'diode',
        spec: { kind: 'ratio', pairWith: 'diode-fwd', minRatio: 10 },
        outcomes: { in_spec: 'f-ecu', low: 'f-diode', open: 'f-diode' },
      },
      finding('f-fuel', 'Ignition is fine', 'Go on to fuel and compression.'),
      finding('f-battery', 'Battery', 'Charge and load-test the battery; replace if it fails.'),
      finding('f-ckp', 'Crank position sensor', 'Replace the sensor and prove the fix.'),
      finding('f-harness', 'Sensor harness', 'Repair the harness between sensor and control unit.'),
      finding('f-diode', 'Interlock diode', 'Replace the diode.'),
      finding('f-ecu', 'Control unit', 'Check the control unit per the service manual.'),
    ],
  };
}

function finding(id: string, part: string, action: string): ProcedureDocument['checks'][number] {
  return { id, kind: 'finding', title: part, instruction: '', finding: { part, action } };
}
