import type { ProcedureDocument } from '@shared/engine/procedure';
import { CAUTION } from './cautions';

/**
 * Demo content, invented for the demo shop: the Nordane ATVs' lighting circuit and every window below are
 * made up. The orders of magnitude follow common trade practice (a clean connection drops at most about
 * 0.2 V under load; a cold halogen filament reads well under an ohm or two).
 *
 * Headlight connector (3-pin): W white low beam · Y yellow high beam · B black ground.
 */
const HEADLIGHT = 'Headlight connector (3-pin)';

export const headlightDead: ProcedureDocument = {
  startCheckId: 'battery-volts',
  cautions: [CAUTION.manualFirst, CAUTION.hydrogen, CAUTION.atvParked, CAUTION.powerOffOhms],
  checks: [
    {
      id: 'battery-volts',
      kind: 'measure',
      title: 'Battery voltage',
      instruction: 'Ignition off. Measure across the battery posts; later checks compare the supply at the headlight with this reading.',
      probe: { connector: 'Battery posts', wireColours: ['red', 'black'] },
      cautions: [CAUTION.hydrogen],
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_least', min: 12.2, unit: 'V' },
      outcomes: { in_spec: 'bulb-filament', low: 'finding-battery' },
    },
    {
      id: 'bulb-filament',
      kind: 'measure',
      title: 'Low-beam filament',
      instruction: 'Take the bulb out (don’t touch the glass). Measure between the low-beam tab and the ground tab. Null the leads first.',
      probe: { connector: 'Headlight bulb, out of the lamp', pins: ['low', 'ground'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'continuity',
      meterFunction: 'ohms',
      spec: { kind: 'expect_continuity', max: 2, unit: 'Ω' },
      outcomes: { in_spec: 'fuse-headlight', high: 'finding-bulb', open: 'finding-bulb' },
    },
    {
      id: 'fuse-headlight',
      kind: 'measure',
      title: 'Headlight fuse (15 A)',
      instruction: 'Ignition off. Pull the 15 A HEAD fuse and measure across its blades out of the holder.',
      probe: { connector: 'Fuse box, HEAD 15 A' },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'continuity',
      meterFunction: 'ohms',
      spec: { kind: 'expect_continuity', max: 0.5, unit: 'Ω' },
      outcomes: { in_spec: 'supply-at-connector', high: 'finding-fuse-holder', open: 'fuse-short-check' },
    },
    {
      id: 'fuse-short-check',
      kind: 'measure',
      title: 'Headlight circuit to ground, fuse out',
      instruction: 'Fuse still out, bulbs unplugged, light switch on low beam. Measure from the load side of the HEAD fuse socket to the battery negative post.',
      probe: { connector: 'Fuse box, HEAD 15 A socket, load side' },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'resistance',
      meterFunction: 'ohms',
      spec: { kind: 'expect_open', openAbove: 10_000, unit: 'Ω' },
      outcomes: { in_spec: 'finding-fuse-blown', low: 'finding-short-to-ground' },
    },
    {
      id: 'supply-at-connector',
      kind: 'measure',
      title: 'Supply at the headlight connector',
      instruction: 'Fuse back in, bulb unplugged. Ignition on, light switch on low beam. Measure from pin W (white) to the battery negative post. It must agree with the battery reading within 0.5 V.',
      probe: { connector: HEADLIGHT, pins: ['W'], wireColours: ['white'] },
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'agree_with', checkId: 'battery-volts', tolAbs: 0.5, unit: 'V' },
      outcomes: { in_spec: 'ground-drop', low: 'dimmer-switch', high: 'ground-drop' },
    },
    {
      id: 'dimmer-switch',
      kind: 'measure',
      title: 'Dimmer switch, low position',
      instruction: 'Ignition off. Unplug the left handlebar switch and measure between the blue/white (in) and white (low beam out) terminals with the switch on low.',
      probe: { connector: 'Left handlebar switch connector (8-pin)', wireColours: ['blue/white', 'white'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'continuity',
      meterFunction: 'ohms',
      spec: { kind: 'expect_continuity', max: 1.0, unit: 'Ω' },
      outcomes: { in_spec: 'finding-supply-wiring', high: 'finding-dimmer-switch', open: 'finding-dimmer-switch' },
    },
    {
      id: 'ground-drop',
      kind: 'measure',
      title: 'Ground side voltage drop, bulb lit',
      instruction: 'Bulb and connector back in, low beam on. Back-probe pin B (black) to the battery negative post. A good ground drops almost nothing; an open one floats up towards battery voltage.',
      probe: { connector: HEADLIGHT, pins: ['B'], wireColours: ['black'] },
      quantity: 'voltage_dc',
      meterFunction: 'dc_volts',
      spec: { kind: 'at_most', max: 0.2, unit: 'V' },
      outcomes: { in_spec: 'finding-connector', high: 'ground-continuity' },
    },
    {
      id: 'ground-continuity',
      kind: 'measure',
      title: 'Ground wire to battery negative',
      instruction: 'Ignition off, battery negative off, headlight connector unplugged. Pin B (black) to the battery negative cable terminal. Null the leads first.',
      probe: { connector: HEADLIGHT, pins: ['B'], wireColours: ['black'] },
      cautions: [CAUTION.powerOffOhms],
      quantity: 'continuity',
      meterFunction: 'ohms',
      spec: { kind: 'expect_continuity', max: 0.5, unit: 'Ω' },
      outcomes: { in_spec: 'finding-ground-eyelet', high: 'finding-ground-wire', open: 'finding-ground-wire' },
    },
    {
      id: 'finding-battery',
      kind: 'finding',
      title: 'Battery low',
      instruction: 'The battery is too low to judge the lighting circuit.',
      finding: { part: 'Battery', action: 'Charge and load-test the battery, then repeat this diagnosis.' },
    },
    {
      id: 'finding-bulb',
      kind: 'finding',
      title: 'Bulb filament open',
      instruction: 'The low-beam filament is broken.',
      finding: { part: 'Headlight bulb', action: 'Fit a new bulb of the same rating without touching the glass; check the lamp for water that may have cracked it.' },
    },
    {
      id: 'finding-fuse-holder',
      kind: 'finding',
      title: 'Fuse or holder corroded',
      instruction: 'The fuse passes current but with too much resistance.',
      finding: { part: 'HEAD fuse and its holder', action: 'Replace the fuse, clean the holder contacts and seal the fuse box cover.' },
    },
    {
      id: 'finding-fuse-blown',
      kind: 'finding',
      title: 'Fuse blown, no short now',
      instruction: 'The fuse is open but the circuit does not short to ground now.',
      finding: { part: 'HEAD fuse 15 A', action: 'Fit a new fuse and run the lights for 10 minutes while flexing the harness at the steering; if it blows again look for an intermittent short.' },
    },
    {
      id: 'finding-short-to-ground',
      kind: 'finding',
      title: 'Headlight circuit shorted to ground',
      instruction: 'The fused circuit reads low to ground with the bulbs out.',
      finding: { part: 'Headlight wiring (white, blue/white)', action: 'Unplug along the circuit to split it, find the chafe or pinched wire, repair it and fit a new fuse.' },
    },
    {
      id: 'finding-dimmer-switch',
      kind: 'finding',
      title: 'Dimmer switch contacts open',
      instruction: 'The dimmer switch does not pass current on low.',
      finding: { part: 'Left handlebar switch (dimmer)', action: 'Clean the dimmer contacts or replace the switch housing.' },
    },
    {
      id: 'finding-supply-wiring',
      kind: 'finding',
      title: 'Break in the low-beam supply wire',
      instruction: 'The dimmer switch is good but the supply does not reach the headlight connector.',
      finding: { part: 'White wire from the dimmer switch to the headlight connector', action: 'Trace the wire for a break or a spread terminal; repair and re-test the supply.' },
    },
    {
      id: 'finding-connector',
      kind: 'finding',
      title: 'Headlight connector terminals',
      instruction: 'Bulb, supply and ground test good: the fault is where the bulb meets its connector.',
      finding: { part: 'Headlight connector', action: 'Look for burnt or spread terminals; replace the connector with a new pigtail and seal it.' },
    },
    {
      id: 'finding-ground-eyelet',
      kind: 'finding',
      title: 'Ground eyelet poor under load',
      instruction: 'The ground wire reads good unloaded but drops voltage with the bulb lit.',
      finding: { part: 'Headlight ground eyelet on the frame', action: 'Clean the eyelet and frame to bare metal, re-torque, and protect with grease. Re-test the ground drop.' },
    },
    {
      id: 'finding-ground-wire',
      kind: 'finding',
      title: 'Break in the ground wire',
      instruction: 'The black ground wire does not reach the battery negative.',
      finding: { part: 'Black ground wire from the headlight to the frame', action: 'Trace and repair the break; re-test the ground drop.' },
    },
  ],
};

/**
 * The draft a lead is working on: looks at the connector before naming it, and adds a way out when it
 * looks fine.
 */
export const headlightDeadDraft: ProcedureDocument = {
  ...headlightDead,
  checks: [
    ...headlightDead.checks.map((c) => (c.id === 'ground-drop' && c.kind === 'measure' ? { ...c, outcomes: { ...c.outcomes, in_spec: 'connector-inspect' } } : c)),
    {
      id: 'connector-inspect',
      kind: 'observe',
      title: 'Look at the headlight connector',
      instruction: 'Ignition off. Unplug the headlight connector and look at the terminals on both halves under a good light.',
      cautions: [CAUTION.ignitionOffUnplug],
      choices: [
        { id: 'burnt', label: 'Burnt, green or spread terminals', next: 'finding-connector' },
        { id: 'clean', label: 'Terminals look clean and tight', next: 'finding-not-isolated' },
      ],
    },
    {
      id: 'finding-not-isolated',
      kind: 'finding',
      title: 'Not isolated by this procedure',
      instruction: 'Supply, ground, bulb and connector all look good.',
      finding: { part: 'Not yet known', action: 'Wiggle-test the harness at the steering with the light on and ask the lead technician.' },
    },
  ],
};
