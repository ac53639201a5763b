import type { Check, ProcedureDocument } from '@shared/engine/procedure';
import { CAUTION } from './cautions';

/**
 * Demo content, invented for the demo shop: the Pippit scooters, their start circuit and every window below
 * are made up. The orders of magnitude follow common trade practice (relay coil a few ohms, a clean
 * connection drops at most 0.1–0.2 V under load, diode drop 0.4–0.8 V).
 *
 * Start circuit: main fuse → ignition switch → either brake-lever switch → start diode → start button →
 * relay coil + (yellow/red); relay coil − (green/yellow) → side-stand switch → ground.
 */
const RELAY = 'Starter relay (under the floor panel)';

/** Version 2, published after two scooters came back with a faulty side-stand switch blamed on the harness. */
export const starterNoEngage: ProcedureDocument = {
  startCheckId: 'battery-rest',
  cautions: [CAUTION.manualFirst, CAUTION.hydrogen, CAUTION.scooterStand, CAUTION.cranking, CAUTION.ammeterSeries],
  checks: [
    {
      id: 'battery-rest',
      kind: 'measure',
      title: 'Battery voltage at rest',
      instruction: 'Ignition off, nothing switched on. Measure across the battery posts under the floor panel.',
      probe: { connector: 'Battery posts', wireColours: ['red', 'black'] },
      cautions: [CAUTION.hydrogen],
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_least', min: 12.4, unit: 'V' },
      outcomes: { in_spec: 'relay-click', low: 'finding-battery' },
    },
    {
      id: 'relay-click',
      kind: 'observe',
      title: 'Listen at the starter relay',
      instruction: 'Scooter on the centre stand. Ignition on, side stand up, hold a brake lever and press the start button for a second while a helper listens at the relay.',
      cautions: [CAUTION.scooterStand, CAUTION.cranking],
      choices: [
        { id: 'no-click', label: 'No click, nothing happens', next: 'relay-coil-supply' },
        { id: 'click', label: 'The relay clicks but the starter does not turn', next: 'drop-relay' },
        { id: 'slow', label: 'The starter turns slowly or stalls', next: 'drop-relay' },
      ],
    },
    {
      id: 'relay-coil-supply',
      kind: 'measure',
      title: 'Relay coil supply with start pressed',
      instruction: 'Relay plugged in. Back-probe the coil + terminal (yellow/red) to the battery negative post, ignition on, brake lever held, start button pressed.',
      probe: { connector: RELAY, pins: ['coil +'], wireColours: ['yellow/red'] },
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_least', min: 10.5, unit: 'V' },
      outcomes: { in_spec: 'relay-coil-ground', low: 'brake-switch' },
    },
    {
      id: 'brake-switch',
      kind: 'measure',
      title: 'Brake-lever switch, lever pulled',
      instruction: 'Ignition off. Unplug the left brake-lever switch and measure across its two terminals with the lever pulled. Null the leads first.',
      probe: { connector: 'Left brake-lever switch (2 spade terminals)', wireColours: ['brown', 'yellow/green'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'continuity',
      meterFunction: 'ohms',
      spec: { kind: 'expect_continuity', max: 1.0, unit: 'Ω' },
      outcomes: { in_spec: 'start-diode-forward', high: 'finding-brake-switch', open: 'finding-brake-switch' },
    },
    {
      id: 'start-diode-forward',
      kind: 'measure',
      title: 'Start diode, forward',
      instruction: 'Unplug the start diode from the harness by the relay. Diode test: red probe on the yellow/green side, black probe on the yellow side.',
      probe: { connector: 'Start diode (2-pin, taped to the harness by the relay)', wireColours: ['yellow/green', 'yellow'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'diode',
      meterFunction: 'diode',
      spec: { kind: 'window', min: 0.4, max: 0.8, unit: 'V' },
      outcomes: { in_spec: 'start-diode-reverse', low: 'finding-start-diode', high: 'finding-start-diode', open: 'finding-start-diode' },
    },
    {
      id: 'start-diode-reverse',
      kind: 'measure',
      title: 'Start diode, reverse',
      instruction: 'Swap the probes. A good diode reads OL this way.',
      probe: { connector: 'Start diode (2-pin, taped to the harness by the relay)', wireColours: ['yellow', 'yellow/green'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'diode',
      meterFunction: 'diode',
      spec: { kind: 'ratio', pairWith: 'start-diode-forward', minRatio: 4 },
      outcomes: { in_spec: 'start-button', low: 'finding-start-diode', open: 'finding-start-diode' },
    },
    {
      id: 'start-button',
      kind: 'measure',
      title: 'Start button, pressed',
      instruction: 'Unplug the right handlebar switch. Measure across the start button terminals (yellow in, yellow/red out) with the button held in.',
      probe: { connector: 'Right handlebar switch connector (6-pin)', wireColours: ['yellow', 'yellow/red'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'continuity',
      meterFunction: 'ohms',
      spec: { kind: 'expect_continuity', max: 1.0, unit: 'Ω' },
      outcomes: { in_spec: 'finding-supply-harness', high: 'finding-start-button', open: 'finding-start-button' },
    },
    {
      id: 'relay-coil-ground',
      kind: 'measure',
      title: 'Relay coil ground with start pressed',
      instruction: 'Back-probe the coil − terminal (green/yellow) to the battery negative post, ignition on, side stand up, brake held, start pressed. A good ground reads near zero; an open one floats up to battery voltage.',
      probe: { connector: RELAY, pins: ['coil −'], wireColours: ['green/yellow'] },
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_most', max: 0.5, unit: 'V' },
      outcomes: { in_spec: 'relay-coil-resistance', high: 'sidestand-switch' },
    },
    {
      id: 'sidestand-switch',
      kind: 'measure',
      title: 'Side-stand switch, stand up',
      instruction: 'Ignition off. Unplug the side-stand switch and measure across its green/yellow and green terminals with the stand fully up.',
      probe: { connector: 'Side-stand switch (2-pin)', wireColours: ['green/yellow', 'green'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'continuity',
      meterFunction: 'ohms',
      spec: { kind: 'expect_continuity', max: 1.0, unit: 'Ω' },
      outcomes: { in_spec: 'finding-ground-harness', high: 'finding-sidestand-switch', open: 'finding-sidestand-switch' },
    },
    {
      id: 'relay-coil-resistance',
      kind: 'measure',
      title: 'Relay coil resistance',
      instruction: 'Ignition off. Pull the relay and measure across its coil terminals. The window is for the coil at 20 °C and is corrected to the ambient temperature.',
      probe: { connector: `${RELAY}, relay removed`, pins: ['coil +', 'coil −'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'resistance',
      meterFunction: 'ohms',
      range: 60,
      spec: { kind: 'window', min: 3.0, max: 5.0, unit: 'Ω', copperAt20C: true },
      outcomes: { in_spec: 'relay-bench', low: 'finding-relay', high: 'finding-relay', open: 'finding-relay' },
    },
    {
      id: 'relay-bench',
      kind: 'observe',
      title: 'Relay on the bench',
      instruction: 'Power the relay coil from the battery with fused jumper leads and measure continuity across the main terminals while it is powered.',
      cautions: [CAUTION.fusedJumper, CAUTION.hydrogen],
      choices: [
        { id: 'closes', label: 'Clicks and the main contacts close', next: 'finding-relay-connector' },
        { id: 'fails', label: 'No click, or the contacts stay open', next: 'finding-relay' },
      ],
    },
    {
      id: 'drop-relay',
      kind: 'measure',
      title: 'Voltage drop across the relay contacts',
      instruction: 'Volts only, never amps. Probes on the two relay main terminals (the heavy red wires); hold a brake lever and press start for 2–3 s. A closed, clean contact drops almost nothing.',
      probe: { connector: RELAY, pins: ['main in', 'main out'], wireColours: ['red', 'red/white'] },
      cautions: [CAUTION.ammeterSeries, CAUTION.scooterStand, CAUTION.cranking],
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_most', max: 0.2, unit: 'V' },
      outcomes: { in_spec: 'drop-positive-cable', high: 'finding-relay-contacts' },
    },
    {
      id: 'drop-positive-cable',
      kind: 'measure',
      title: 'Voltage drop, battery positive to starter terminal',
      instruction: 'Red probe on the battery positive post (not the clamp), black probe on the starter motor terminal. Brake held, press start for 2–3 s.',
      probe: { connector: 'Battery + post to starter terminal', wireColours: ['red', 'red/white'] },
      cautions: [CAUTION.scooterStand, CAUTION.cranking, CAUTION.hydrogen],
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_most', max: 0.3, unit: 'V' },
      outcomes: { in_spec: 'drop-ground-cable', high: 'finding-positive-cable' },
    },
    {
      id: 'drop-ground-cable',
      kind: 'measure',
      title: 'Voltage drop, starter case to battery negative',
      instruction: 'Red probe on bare metal of the starter motor case, black probe on the battery negative post. Brake held, press start for 2–3 s.',
      probe: { connector: 'Starter case to battery − post', wireColours: ['black'] },
      cautions: [CAUTION.scooterStand, CAUTION.cranking, CAUTION.hydrogen],
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_most', max: 0.2, unit: 'V' },
      outcomes: { in_spec: 'finding-starter-motor', high: 'finding-ground-cable' },
    },
    {
      id: 'finding-battery',
      kind: 'finding',
      title: 'Battery low',
      instruction: 'The battery is below the level this procedure needs.',
      finding: { part: 'Battery', action: 'Charge and load-test the battery; replace it if it fails. Repeat this diagnosis if the starter still does not engage.' },
    },
    {
      id: 'finding-brake-switch',
      kind: 'finding',
      title: 'Brake-lever switch open',
      instruction: 'The switch does not close when the lever is pulled.',
      finding: { part: 'Brake-lever switch', action: 'Replace the switch; check the brake light works from both levers afterwards.' },
    },
    {
      id: 'finding-start-diode',
      kind: 'finding',
      title: 'Start diode faulty',
      instruction: 'The diode does not read one way only.',
      finding: { part: 'Start diode', action: 'Replace the start diode and check that the brake light does not light from the start button.' },
    },
    {
      id: 'finding-start-button',
      kind: 'finding',
      title: 'Start button contacts open',
      instruction: 'The button does not close when pressed.',
      finding: { part: 'Right handlebar switch (start button)', action: 'Clean the button contacts or replace the switch housing.' },
    },
    {
      id: 'finding-supply-harness',
      kind: 'finding',
      title: 'Break in the start supply wiring',
      instruction: 'Every part of the supply side tests good but the relay coil gets no supply.',
      finding: { part: 'Wiring from the brake switches to relay coil + (yellow/green, yellow, yellow/red)', action: 'Trace the wires for a break or a spread connector terminal; repair and re-test the coil supply.' },
    },
    {
      id: 'finding-sidestand-switch',
      kind: 'finding',
      title: 'Side-stand switch open',
      instruction: 'The switch does not close with the stand up.',
      finding: { part: 'Side-stand switch', action: 'Replace the switch; clean mud out of the stand pivot and check the spring returns the stand fully.' },
    },
    {
      id: 'finding-ground-harness',
      kind: 'finding',
      title: 'Break in the relay ground wiring',
      instruction: 'The relay coil gets no ground though the side-stand switch is good.',
      finding: { part: 'Wiring from relay coil − to ground (green/yellow, green)', action: 'Trace the wires and the frame ground eyelet; repair and re-test the coil ground.' },
    },
    {
      id: 'finding-relay',
      kind: 'finding',
      title: 'Starter relay faulty',
      instruction: 'The relay coil is out of its window or the relay does not close on the bench.',
      finding: { part: 'Starter relay', action: 'Replace the relay. Check the main fuse in its housing while it is out.' },
    },
    {
      id: 'finding-relay-connector',
      kind: 'finding',
      title: 'Relay connector terminals',
      instruction: 'The relay works on the bench but not in its socket.',
      finding: { part: 'Relay connector', action: 'Clean or replace the spread or corroded coil terminals in the relay connector.' },
    },
    {
      id: 'finding-relay-contacts',
      kind: 'finding',
      title: 'Relay main contacts burnt',
      instruction: 'The relay closes but its contacts drop too much voltage under load.',
      finding: { part: 'Starter relay', action: 'Replace the relay; look for a dragging starter motor that may have burnt the contacts.' },
    },
    {
      id: 'finding-positive-cable',
      kind: 'finding',
      title: 'Positive cable or terminals',
      instruction: 'Too much voltage is lost between the battery and the starter.',
      finding: { part: 'Battery positive cable, relay cable or their terminals', action: 'Clean and tighten the terminals; replace a cable that is corroded inside its insulation. Re-test the drop.' },
    },
    {
      id: 'finding-ground-cable',
      kind: 'finding',
      title: 'Ground cable or engine ground',
      instruction: 'Too much voltage is lost between the starter case and the battery negative.',
      finding: { part: 'Battery negative cable and engine ground strap', action: 'Clean the ground points to bare metal and re-torque; replace a corroded cable. Re-test the drop.' },
    },
    {
      id: 'finding-starter-motor',
      kind: 'finding',
      title: 'Starter motor faulty',
      instruction: 'Full voltage reaches the starter and its ground but it does not turn properly.',
      finding: { part: 'Starter motor', action: 'Remove the starter; check brushes, commutator and bushes. Repair or replace and check the starter clutch.' },
    },
  ],
};

/**
 * Version 1 as first published: a relay coil without ground went straight to the harness finding, with no
 * side-stand switch check in between.
 */
export const starterNoEngageV1: ProcedureDocument = {
  ...starterNoEngage,
  checks: starterNoEngage.checks
    .filter((c) => c.id !== 'sidestand-switch' && c.id !== 'finding-sidestand-switch')
    .map((c): Check => {
      if (c.id === 'relay-coil-ground' && c.kind === 'measure') return { ...c, outcomes: { ...c.outcomes, high: 'finding-ground-harness' } };
      if (c.id === 'finding-ground-harness' && c.kind === 'finding') {
        return { ...c, instruction: 'The relay coil gets no ground.', finding: { ...c.finding, part: 'Side-stand switch or the relay ground wiring (green/yellow, green)', action: 'Check the side-stand switch, then trace the wires and the frame ground eyelet; repair and re-test the coil ground.' } };
      }
      return c;
    }),
};
