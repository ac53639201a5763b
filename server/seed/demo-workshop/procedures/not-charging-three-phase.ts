import type { MeasureCheck, ProcedureDocument } from '@shared/engine/procedure';
import { CAUTION } from './cautions';

/**
 * Demo content, invented for the demo shop: the Nordane ATVs, their regulator pinout and every window below
 * are made up. The orders of magnitude follow common trade practice (regulated 13.5–15 V at raised speed,
 * stator windings a few tenths of an ohm phase to phase and open to ground, rested OCV per the BCI table).
 *
 * Regulator/rectifier 5-pin connector: Y1, Y2, Y3 yellow stator phases · B+ red output · G green ground.
 */
const REG = 'Regulator/rectifier 5-pin connector';

const phasePairs = [
  ['1', 'Y1', 'Y2'],
  ['2', 'Y2', 'Y3'],
  ['3', 'Y3', 'Y1'],
] as const;

const statorResistance = (n: 0 | 1 | 2): MeasureCheck => {
  const [i, a, b] = phasePairs[n];
  return {
    id: `stator-res-${i}`,
    kind: 'measure',
    title: `Stator resistance ${a}–${b}`,
    instruction: `Engine off and cold, ignition off. Regulator unplugged; on the stator side of the connector measure ${a} to ${b}. Null the leads first (REL): at a few tenths of an ohm the leads matter. The window is for the winding at 20 °C and is corrected to the ambient temperature.`,
    probe: { connector: `${REG}, stator side`, pins: [a, b], wireColours: ['yellow', 'yellow'] },
    cautions: [CAUTION.powerOffOhms],
    quantity: 'resistance',
    meterFunction: 'ohms',
    range: 60,
    spec: { kind: 'window', min: 0.2, max: 0.6, unit: 'Ω', copperAt20C: true },
    outcomes: {
      in_spec: n === 2 ? 'stator-ground' : `stator-res-${phasePairs[n + 1][0]}`,
      low: 'finding-stator-winding',
      high: 'finding-stator-winding',
      open: 'finding-stator-winding',
    },
  };
};

const statorOutput = (n: 0 | 1 | 2): MeasureCheck => {
  const [i, a, b] = phasePairs[n];
  return {
    id: `stator-ac-${i}`,
    kind: 'measure',
    title: `Stator output ${a}–${b} at 4000 rpm`,
    instruction: `Regulator still unplugged. Start the engine and hold 4000 rpm. AC volts on the stator side, ${a} to ${b}.`,
    probe: { connector: `${REG}, stator side`, pins: [a, b], wireColours: ['yellow', 'yellow'] },
    cautions: [CAUTION.running, CAUTION.atvParked, CAUTION.unloadedAc],
    quantity: 'voltage_ac',
    meterFunction: 'ac_volts',
    spec: { kind: 'at_least', min: 45, unit: 'V' },
    outcomes: { in_spec: n === 2 ? 'reg-ground' : `stator-ac-${phasePairs[n + 1][0]}`, low: 'finding-stator-weak' },
  };
};

export const notChargingThreePhase: ProcedureDocument = {
  startCheckId: 'battery-ocv',
  cautions: [CAUTION.manualFirst, CAUTION.hydrogen, CAUTION.running, CAUTION.atvParked, CAUTION.powerOffOhms],
  checks: [
    {
      id: 'battery-ocv',
      kind: 'measure',
      title: 'Battery rested open-circuit voltage',
      instruction:
        'The battery must have rested at least 8 hours with no charge or load. Ignition off; measure across the posts. Flooded battery, rested: 12.65 V is about 100 %, 12.45 V about 75 %, 12.24 V about 50 % (Battery Council International table). A charge-system test on a part-charged battery means little.',
      probe: { connector: 'Battery posts', wireColours: ['red', 'black'] },
      cautions: [CAUTION.hydrogen],
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_least', min: 12.4, unit: 'V' },
      marginalPolicy: 'branch',
      retest: { maxVisits: 2, whenExhausted: 'charge-battery' },
      outcomes: { in_spec: 'charging-voltage', low: 'charge-battery', marginal: 'remove-surface-charge' },
    },
    {
      id: 'remove-surface-charge',
      kind: 'task',
      title: 'Remove surface charge, then measure again',
      instruction: 'Switch the headlights on for one minute, switch them off and wait 5 minutes, then measure the battery again.',
      cautions: [CAUTION.hydrogen],
      next: 'battery-ocv',
    },
    {
      id: 'charge-battery',
      kind: 'task',
      title: 'Charge the battery',
      instruction: 'Charge the battery fully on the shop charger at the setting for its type, let it rest an hour, and load-test it. Refit it before going on.',
      cautions: [CAUTION.hydrogen],
      next: 'charging-voltage',
    },
    {
      id: 'charging-voltage',
      kind: 'measure',
      title: 'Charging voltage at 4000 rpm',
      instruction: 'Start the engine, headlights on, hold 4000 rpm. Measure across the battery posts.',
      probe: { connector: 'Battery posts', wireColours: ['red', 'black'] },
      cautions: [CAUTION.running, CAUTION.atvParked, CAUTION.hydrogen],
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'window', min: 13.5, max: 15.0, unit: 'V' },
      outcomes: { in_spec: 'finding-charging-ok', low: 'stator-res-1', high: 'reg-ground' },
    },
    statorResistance(0),
    statorResistance(1),
    statorResistance(2),
    {
      id: 'stator-ground',
      kind: 'measure',
      title: 'Stator insulation to ground',
      instruction: 'Engine off. Each yellow pin on the stator side in turn to bare metal on the engine; enter the lowest reading.',
      probe: { connector: `${REG}, stator side`, pins: ['Y1', 'Y2', 'Y3'], wireColours: ['yellow'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'resistance',
      meterFunction: 'ohms',
      spec: { kind: 'expect_open', openAbove: 1e6, unit: 'Ω' },
      outcomes: { in_spec: 'stator-ac-1', low: 'finding-stator-grounded' },
    },
    statorOutput(0),
    statorOutput(1),
    statorOutput(2),
    {
      id: 'reg-ground',
      kind: 'measure',
      title: 'Regulator ground to battery negative',
      instruction: 'Engine off, ignition off, battery negative off, regulator unplugged. Harness side pin G (green) to the battery negative cable terminal. Null the leads first.',
      probe: { connector: `${REG}, harness side`, pins: ['G'], wireColours: ['green'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'continuity',
      meterFunction: 'ohms',
      spec: { kind: 'expect_continuity', max: 0.5, unit: 'Ω' },
      outcomes: { in_spec: 'reg-charge-wire', high: 'finding-reg-ground', open: 'finding-reg-ground' },
    },
    {
      id: 'reg-charge-wire',
      kind: 'measure',
      title: 'Charge wire to battery positive',
      instruction: 'Still unplugged and the battery negative off. Harness side pin B+ (red) to the battery positive cable terminal; this includes the 30 A main fuse.',
      probe: { connector: `${REG}, harness side`, pins: ['B+'], wireColours: ['red'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'continuity',
      meterFunction: 'ohms',
      spec: { kind: 'expect_continuity', max: 0.5, unit: 'Ω' },
      outcomes: { in_spec: 'rect-diode-forward', high: 'finding-charge-wire', open: 'finding-charge-wire' },
    },
    {
      id: 'rect-diode-forward',
      kind: 'measure',
      title: 'Rectifier diode Y1 to B+, forward',
      instruction: 'On the regulator itself (unit side): meter on diode test, red probe on Y1, black probe on B+.',
      probe: { connector: `${REG}, unit side`, pins: ['Y1', 'B+'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'diode',
      meterFunction: 'diode',
      spec: { kind: 'window', min: 0.3, max: 0.8, unit: 'V' },
      outcomes: { in_spec: 'rect-diode-reverse', low: 'finding-rectifier', high: 'finding-rectifier', open: 'finding-rectifier' },
    },
    {
      id: 'rect-diode-reverse',
      kind: 'measure',
      title: 'Rectifier diode Y1 to B+, reverse',
      instruction: 'Swap the probes: red on B+, black on Y1. A good rectifier reads OL this way.',
      probe: { connector: `${REG}, unit side`, pins: ['B+', 'Y1'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'diode',
      meterFunction: 'diode',
      spec: { kind: 'ratio', pairWith: 'rect-diode-forward', minRatio: 4 },
      outcomes: { in_spec: 'replace-regulator', low: 'finding-rectifier', open: 'finding-rectifier' },
    },
    {
      id: 'replace-regulator',
      kind: 'task',
      title: 'Fit a known-good regulator/rectifier',
      instruction: 'Battery negative off. Fit the shop’s test regulator for the Fellrunner, plug it in, battery negative back on last.',
      cautions: [CAUTION.hydrogen],
      next: 'prove-charging',
    },
    {
      id: 'prove-charging',
      kind: 'measure',
      title: 'Charging voltage with the known-good regulator',
      instruction: 'Engine running, headlights on, 4000 rpm. Measure across the battery posts.',
      probe: { connector: 'Battery posts', wireColours: ['red', 'black'] },
      cautions: [CAUTION.running, CAUTION.atvParked],
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'window', min: 13.5, max: 15.0, unit: 'V' },
      outcomes: { in_spec: 'finding-regulator', low: 'finding-not-isolated', high: 'finding-not-isolated' },
    },
    {
      id: 'finding-charging-ok',
      kind: 'finding',
      title: 'Charging system works at test',
      instruction: 'The charging voltage is in its window with the lights on.',
      finding: {
        part: 'None in the charging system',
        action: 'Load-test the battery, then run the parked-drain procedure: a battery that goes flat with a good charge rate is worn or drained.',
      },
    },
    {
      id: 'finding-stator-winding',
      kind: 'finding',
      title: 'Stator winding out of its window',
      instruction: 'A phase pair reads open, shorted or out of its window.',
      finding: { part: 'Stator', action: 'Replace the stator and the stator cover gasket; check the regulator connector for heat damage while it is apart.' },
    },
    {
      id: 'finding-stator-grounded',
      kind: 'finding',
      title: 'Stator shorted to ground',
      instruction: 'A stator winding leaks to the engine.',
      finding: { part: 'Stator', action: 'Replace the stator and the stator cover gasket. Look for burnt poles and check the regulator connector pins for heat damage.' },
    },
    {
      id: 'finding-stator-weak',
      kind: 'finding',
      title: 'Stator output too low',
      instruction: 'Windings measure good but a phase gives too little voltage at speed.',
      finding: { part: 'Stator or flywheel magnets', action: 'Inspect the flywheel magnets for cracks or loose segments; replace the stator (and flywheel if damaged).' },
    },
    {
      id: 'finding-reg-ground',
      kind: 'finding',
      title: 'Regulator ground poor',
      instruction: 'The regulator’s ground does not reach the battery negative cleanly.',
      finding: { part: 'Regulator ground wire and eyelet', action: 'Clean and re-torque the ground eyelet; repair the green wire. Re-test the charging voltage.' },
    },
    {
      id: 'finding-charge-wire',
      kind: 'finding',
      title: 'Charge wire or main fuse open',
      instruction: 'The regulator output does not reach the battery positive.',
      finding: { part: 'Red charge wire, 30 A main fuse or its holder', action: 'Replace the fuse or repair the wire and holder; re-test the charging voltage.' },
    },
    {
      id: 'finding-rectifier',
      kind: 'finding',
      title: 'Rectifier diode faulty',
      instruction: 'A rectifier diode does not read one way only.',
      finding: { part: 'Regulator/rectifier', action: 'Replace the regulator/rectifier; check its connector pins for heat damage and use fresh dielectric grease.' },
    },
    {
      id: 'finding-regulator',
      kind: 'finding',
      title: 'Regulator faulty',
      instruction: 'A known-good regulator brings the charging voltage into its window.',
      finding: { part: 'Regulator/rectifier', action: 'Fit a new regulator/rectifier and re-test the charging voltage with the lights on.' },
    },
    {
      id: 'finding-not-isolated',
      kind: 'finding',
      title: 'Not isolated by this procedure',
      instruction: 'Every part tested good and a known-good regulator did not fix the charging voltage.',
      finding: { part: 'Not yet known', action: 'Re-check the readings with a second meter, look for an intermittent connector and ask the lead technician.' },
    },
  ],
};
