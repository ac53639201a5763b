import type { ProcedureDocument } from '@shared/engine/procedure';
import { CAUTION } from './cautions';

/**
 * Demo content, invented for the demo shop: the Veltro twins' fuse box, their sleep current and every window
 * below are made up. The orders of magnitude follow common trade practice (a parked machine draws a few
 * milliamps once its modules sleep; rested OCV per the BCI table).
 */
const FUSES = 'Fuse box under the seat';

export const batteryDrainParked: ProcedureDocument = {
  startCheckId: 'battery-ocv',
  cautions: [CAUTION.manualFirst, CAUTION.hydrogen, CAUTION.ammeterSeries, CAUTION.noCrankInSeries],
  checks: [
    {
      id: 'battery-ocv',
      kind: 'measure',
      title: 'Battery rested open-circuit voltage',
      instruction:
        'The battery must have rested at least 8 hours. Ignition off; measure across the posts. Flooded battery, rested: 12.65 V is about 100 %, 12.45 V about 75 % (Battery Council International table). Start the drain test on a charged battery.',
      probe: { connector: 'Battery posts', wireColours: ['red', 'black'] },
      cautions: [CAUTION.hydrogen],
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_least', min: 12.4, unit: 'V' },
      outcomes: { in_spec: 'draw-setup', low: 'charge-battery' },
    },
    {
      id: 'charge-battery',
      kind: 'task',
      title: 'Charge the battery first',
      instruction: 'Charge the battery fully on the shop charger and let it rest an hour before the drain test.',
      cautions: [CAUTION.hydrogen],
      next: 'draw-setup',
    },
    {
      id: 'draw-setup',
      kind: 'task',
      title: 'Put the meter in series with the battery negative',
      instruction:
        'Ignition off, key out, all accessories off, seat lock closed on its switch if fitted. Disconnect the battery negative cable. Meter on DC amps with the red lead in the 10 A jack: one lead on the negative post, the other on the cable terminal. Wait 15 minutes for the ECU and instruments to sleep, then move the red lead to the mA jack without breaking the circuit (clip a jumper across while you swap).',
      cautions: [CAUTION.ammeterSeries, CAUTION.noCrankInSeries, CAUTION.hydrogen],
      next: 'draw-amps',
    },
    {
      id: 'draw-amps',
      kind: 'measure',
      title: 'Parked current draw',
      instruction:
        'Meter in series on the 60 mA range, everything asleep. Read the steady value. If the reading comes out marginal, the modules may not be fully asleep yet: wait another 10 minutes.',
      probe: { connector: 'Battery negative post to negative cable', wireColours: ['black'] },
      cautions: [CAUTION.ammeterSeries, CAUTION.noCrankInSeries],
      quantity: 'current_dc',
      meterFunction: 'dc_amps',
      range: 0.06,
      spec: { kind: 'at_most', max: 0.004, unit: 'A' },
      marginalPolicy: 'branch',
      retest: { maxVisits: 3, whenExhausted: 'fuse-pull' },
      outcomes: { in_spec: 'finding-battery-worn', high: 'fuse-pull', marginal: 'wait-sleep' },
    },
    {
      id: 'wait-sleep',
      kind: 'task',
      title: 'Wait for the modules to sleep',
      instruction: 'Leave the meter in series and touch nothing for 10 minutes, then read the draw again.',
      cautions: [CAUTION.noCrankInSeries],
      next: 'draw-amps',
    },
    {
      id: 'fuse-pull',
      kind: 'observe',
      title: 'Pull fuses one at a time',
      instruction:
        'Meter still in series. Pull one fuse at a time, watch the meter for a few seconds, and put the fuse back before pulling the next. Which fuse brings the draw under 4 mA?',
      probe: { connector: FUSES },
      cautions: [CAUTION.noCrankInSeries],
      choices: [
        { id: 'accessory', label: 'ACCESSORY 10 A', next: 'accessory-loads' },
        { id: 'ecu', label: 'ECU or INSTRUMENTS', next: 'finding-module-awake' },
        { id: 'none', label: 'No fuse changes the draw', next: 'reg-unplug-draw' },
      ],
    },
    {
      id: 'accessory-loads',
      kind: 'observe',
      title: 'Unplug the accessory loads one at a time',
      instruction: 'ACCESSORY fuse back in. Unplug each accessory on that circuit in turn and watch the meter. Which one brings the draw under 4 mA?',
      cautions: [CAUTION.noCrankInSeries],
      choices: [
        { id: 'usb', label: 'Handlebar USB socket', next: 'finding-usb-socket' },
        { id: 'grips', label: 'Heated grip controller', next: 'finding-grip-controller' },
        { id: 'tracker', label: 'Alarm or tracker', next: 'finding-tracker' },
        { id: 'none', label: 'None of them', next: 'finding-accessory-wiring' },
      ],
    },
    {
      id: 'reg-unplug-draw',
      kind: 'measure',
      title: 'Draw with the regulator/rectifier unplugged',
      instruction: 'Meter still in series. Unplug the regulator/rectifier output connector and read the draw again.',
      probe: { connector: 'Regulator/rectifier output connector (red, green)' },
      cautions: [CAUTION.ammeterSeries, CAUTION.noCrankInSeries],
      quantity: 'current_dc',
      meterFunction: 'dc_amps',
      range: 0.06,
      spec: { kind: 'at_most', max: 0.004, unit: 'A' },
      outcomes: { in_spec: 'finding-rectifier-leak', high: 'finding-unfused-wiring' },
    },
    {
      id: 'finding-battery-worn',
      kind: 'finding',
      title: 'Draw normal: battery does not hold charge',
      instruction: 'The machine draws no more than its sleep current.',
      finding: { part: 'Battery', action: 'Load-test the battery and check its age; replace it if it fails. Advise a maintenance charger for long lay-ups.' },
    },
    {
      id: 'finding-module-awake',
      kind: 'finding',
      title: 'A module stays awake',
      instruction: 'The ECU or instrument circuit keeps drawing after it should sleep.',
      finding: {
        part: 'ECU, instrument cluster or the switched wire that wakes them',
        action: 'With the key out, measure the switched ignition wire at the ECU: it must be 0 V. If it is live, the ignition switch is leaking; if not, the module does not sleep — replace it.',
      },
    },
    {
      id: 'finding-usb-socket',
      kind: 'finding',
      title: 'USB socket drains the battery',
      instruction: 'The handlebar USB socket draws current with the key out.',
      finding: { part: 'Handlebar USB socket and its feed', action: 'Feed the socket from the switched accessory relay so it is live only with the ignition on, or replace it. Re-measure the draw.' },
    },
    {
      id: 'finding-grip-controller',
      kind: 'finding',
      title: 'Heated grip controller drains the battery',
      instruction: 'The heated grip controller draws current with the key out.',
      finding: { part: 'Heated grip controller', action: 'Wire the controller to a switched feed or replace it. Re-measure the draw.' },
    },
    {
      id: 'finding-tracker',
      kind: 'finding',
      title: 'Alarm or tracker draws too much',
      instruction: 'The alarm or tracker draws more than the machine can carry parked.',
      finding: { part: 'Alarm or tracker', action: 'Check its standby setting with the fitter; advise a maintenance charger if the customer keeps it. Re-measure the draw.' },
    },
    {
      id: 'finding-accessory-wiring',
      kind: 'finding',
      title: 'Accessory wiring leaks to ground',
      instruction: 'The accessory circuit draws current with every accessory unplugged.',
      finding: { part: 'Accessory circuit wiring', action: 'Look for water in connectors and chafed wires on the accessory circuit; repair and re-measure the draw.' },
    },
    {
      id: 'finding-rectifier-leak',
      kind: 'finding',
      title: 'Regulator/rectifier leaks',
      instruction: 'The draw falls into spec with the regulator/rectifier unplugged.',
      finding: { part: 'Regulator/rectifier', action: 'Replace the regulator/rectifier (a leaking rectifier diode drains the battery through the stator). Re-measure the draw.' },
    },
    {
      id: 'finding-unfused-wiring',
      kind: 'finding',
      title: 'Drain on an unfused circuit',
      instruction: 'No fuse and not the regulator: the current goes through wiring ahead of the fuse box.',
      finding: { part: 'Wiring between the battery and the fuse box, starter relay', action: 'Inspect the battery and starter relay cables and the main harness near the battery for chafing or water; repair and re-measure the draw.' },
    },
  ],
};
