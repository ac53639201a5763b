import type { DemoProcedureKey } from './procedures';

/**
 * Demo content: invented faults the demo shop meets on each procedure's machines, with how often each turns
 * up, what the customer says, the clue the technician notes on the step that gives it away and what the
 * repair was. The generator walks each procedure towards the scenario's finding with the engine; nothing
 * here states a verdict or a path.
 */

export interface DemoModel {
  make: string;
  model: string;
  engine: string;
  /** Model years on sale. */
  years: readonly [number, number];
  /** The first eight VIN characters (maker and model); the check digit, year, plant and serial follow. */
  vinStart: string;
  plant: string;
  /** Typical distance per year of age, km. */
  kmPerYear: number;
}

export interface FaultScenario {
  finding: string;
  /** How often it turns up, relative to the procedure's other scenarios. */
  weight: number;
  complaints: readonly string[];
  /** Noted on the step that leads to the finding. */
  clue: string;
  repair: string;
  parts: string;
  labour: readonly [number, number];
}

export interface ProcedureScenarios {
  procedure: DemoProcedureKey;
  /** How many generated diagnoses run this procedure. */
  diagnoses: number;
  models: readonly DemoModel[];
  scenarios: readonly FaultScenario[];
}

const tessa: DemoModel = { make: 'Veltro', model: 'Tessa 650', engine: '649 cc parallel twin, CDI', years: [2012, 2017], vinStart: '7VLTS65A', plant: 'K', kmPerYear: 4200 };
const marra: DemoModel = { make: 'Veltro', model: 'Marra 650', engine: '649 cc parallel twin, fuel injected', years: [2018, 2022], vinStart: '7VLMR65A', plant: 'K', kmPerYear: 5100 };
const fell450: DemoModel = { make: 'Nordane', model: 'Fellrunner 450', engine: '449 cc single', years: [2015, 2022], vinStart: '5NDF45XA', plant: 'N', kmPerYear: 1500 };
const fell570: DemoModel = { make: 'Nordane', model: 'Fellrunner 570', engine: '567 cc single, 3-phase charging', years: [2015, 2022], vinStart: '5NDF57XA', plant: 'N', kmPerYear: 1300 };
const wren125: DemoModel = { make: 'Pippit', model: 'Wren 125', engine: '124 cc single, CVT', years: [2016, 2023], vinStart: '3PPW12SC', plant: 'C', kmPerYear: 3800 };
const wren150: DemoModel = { make: 'Pippit', model: 'Wren 150', engine: '149 cc single, CVT', years: [2016, 2023], vinStart: '3PPW15SC', plant: 'C', kmPerYear: 4100 };

const noStart = ['Turns over but won’t fire.', 'Cut out on the motorway and won’t restart.', 'Cranks fine, no sign of life from the engine.'];
const flat = ['Battery goes flat after a few rides.', 'Battery light flickers and it died on the trail.', 'Needs a jump start every week.'];
const noCrank = ['Nothing happens when I press the starter.', 'Starter works sometimes, mostly just a click.', 'Have to kick start it every morning now.'];
const drain = ['Battery dead if it sits for a few days.', 'Flat every Monday morning.', 'New battery, still flat after a week parked.'];
const dark = ['Headlight not working.', 'No low beam since the last wash.', 'Headlight flickers then goes out.'];

export const PROCEDURE_SCENARIOS: readonly ProcedureScenarios[] = [
  {
    procedure: 'no-spark',
    diagnoses: 14,
    models: [tessa],
    scenarios: [
      { finding: 'finding-coil', weight: 3, complaints: ['Runs on one cylinder, then died.', ...noStart], clue: 'Rear cap cracked, tracking marks down the side.', repair: 'Replaced the plug cap and lead on the dead side; both plugs gapped. Fires evenly, test ride fine.', parts: 'Plug cap; HT lead 0.5 m; spark plugs ×2', labour: [35, 70] },
      { finding: 'finding-battery-low', weight: 2, complaints: noStart, clue: 'Cranks slowly; battery is four years old.', repair: 'Battery failed the load test. Fitted a new one and charged it; spark on both sides, started at once.', parts: 'Battery 12 V 12 Ah', labour: [20, 40] },
      { finding: 'finding-fuse', weight: 1, complaints: noStart, clue: 'Fuse looks fine but reads open across its blades.', repair: 'Ignition fuse open with a crack in the link; holder terminals cleaned. New fuse, starts and runs.', parts: 'Fuse 10 A', labour: [15, 30] },
      { finding: 'finding-pulse-coil', weight: 3, complaints: noStart, clue: 'Pulse coil reading well out: winding failing.', repair: 'Replaced the pulse coil under the ignition cover with a new gasket; timing checked. Strong spark.', parts: 'Pulse coil; ignition cover gasket', labour: [70, 120] },
      { finding: 'finding-sensor-harness', weight: 2, complaints: ['Dies when I turn the bars, then restarts.', ...noStart], clue: 'Signal drops between the sensor and the CDI plug.', repair: 'Chafed pulse-coil wire at the steering head repaired with solder sleeves and re-routed in loom.', parts: 'Solder sleeves ×2; split loom 0.4 m', labour: [60, 110] },
      { finding: 'finding-cdi-ground', weight: 1, complaints: noStart, clue: 'Green ground eyelet loose and rusty on the frame.', repair: 'Cleaned the CDI ground eyelet to bare metal, new star washer, dielectric grease.', parts: 'Star washer; ring terminal', labour: [25, 45] },
      { finding: 'finding-coil-primary-circuit', weight: 1, complaints: noStart, clue: 'Primary reads open at the CDI plug, fine at the coil.', repair: 'Broken coil primary wire inside the loom near the battery box; new section spliced in.', parts: 'Wire 1.0 mm² 0.5 m; butt connectors ×2', labour: [45, 80] },
      { finding: 'finding-interlock-circuit', weight: 1, complaints: ['Only starts in neutral with the clutch pulled, then dies.', ...noStart], clue: 'Interlock wire shows volts to ground in neutral.', repair: 'Neutral switch contact corroded; switch replaced, sealing washer renewed, oil topped up.', parts: 'Neutral switch; sealing washer', labour: [40, 70] },
    ],
  },
  {
    procedure: 'not-charging',
    diagnoses: 12,
    models: [fell450, fell570],
    scenarios: [
      { finding: 'finding-stator-winding', weight: 3, complaints: flat, clue: 'One phase reads well off the other two.', repair: 'Stator winding failed on one phase. New stator, cover gasket; charging 14.2 V at 4000 rpm.', parts: 'Stator assembly; stator cover gasket', labour: [120, 180] },
      { finding: 'finding-stator-grounded', weight: 2, complaints: flat, clue: 'Winding to case reads a few kΩ: insulation broken down.', repair: 'Stator burnt through to the core on two poles. Replaced; regulator plug checked and cleaned.', parts: 'Stator assembly; stator cover gasket', labour: [130, 190] },
      { finding: 'finding-stator-weak', weight: 1, complaints: flat, clue: 'AC output low on every pair, resistance fine: weak magnets.', repair: 'Flywheel magnets weak (two cracked). New flywheel and stator; output now 60 V AC per pair.', parts: 'Flywheel; stator assembly; gasket', labour: [150, 210] },
      { finding: 'finding-reg-ground', weight: 2, complaints: flat, clue: 'Regulator ground eyelet green with corrosion.', repair: 'Regulator ground eyelet cleaned and re-crimped; charging 14.3 V afterwards.', parts: 'Ring terminal; heat shrink', labour: [25, 45] },
      { finding: 'finding-charge-wire', weight: 1, complaints: flat, clue: 'Main fuse holder hot-marked, one blade loose.', repair: 'Main fuse holder replaced, charge wire terminal re-crimped.', parts: 'Fuse holder; fuse 30 A', labour: [30, 50] },
      { finding: 'finding-rectifier', weight: 2, complaints: flat, clue: 'Diode conducts both ways on one phase.', repair: 'Regulator/rectifier replaced; charging 14.4 V with the lights on.', parts: 'Regulator/rectifier', labour: [35, 60] },
      { finding: 'finding-charging-ok', weight: 1, complaints: flat, clue: 'Charging normally with everything on.', repair: 'Charging system fine. The customer leaves the heated grips on at idle; advised and battery charged.', parts: '—', labour: [15, 30] },
    ],
  },
  {
    procedure: 'starter',
    diagnoses: 12,
    models: [wren125, wren150],
    scenarios: [
      { finding: 'finding-battery', weight: 2, complaints: noCrank, clue: 'Battery sulphated, swollen case.', repair: 'New battery, charged and load tested; starter spins briskly.', parts: 'Battery 12 V 7 Ah', labour: [15, 30] },
      { finding: 'finding-brake-switch', weight: 2, complaints: ['Starter only works with the left brake.', ...noCrank], clue: 'Right lever switch reads open when pulled.', repair: 'Brake-lever switch replaced; brake light checked on both levers.', parts: 'Brake-lever switch', labour: [20, 35] },
      { finding: 'finding-sidestand-switch', weight: 3, complaints: noCrank, clue: 'Side-stand switch open with the stand up; full of road grit.', repair: 'Side-stand switch replaced; starts with the stand up, cuts out with it down.', parts: 'Side-stand switch', labour: [25, 40] },
      { finding: 'finding-relay', weight: 2, complaints: noCrank, clue: 'Relay coil out of its window.', repair: 'Starter relay replaced; connector cleaned and greased.', parts: 'Starter relay', labour: [20, 35] },
      { finding: 'finding-relay-contacts', weight: 1, complaints: ['Just a click from under the seat.', ...noCrank], clue: 'Big voltage drop across the relay contacts while cranking.', repair: 'Relay contacts burnt; new relay, starter spins at full speed.', parts: 'Starter relay', labour: [20, 35] },
      { finding: 'finding-ground-cable', weight: 1, complaints: noCrank, clue: 'Ground strap drop high; strap eyelet corroded.', repair: 'Engine ground strap replaced, frame point cleaned.', parts: 'Ground strap', labour: [25, 45] },
      { finding: 'finding-starter-motor', weight: 1, complaints: ['Starter turns slowly then stops.', ...noCrank], clue: 'All drops fine; starter motor draws heavily.', repair: 'Starter brushes worn to the limit; starter motor replaced with an exchange unit.', parts: 'Starter motor (exchange); O-ring', labour: [60, 100] },
    ],
  },
  {
    procedure: 'drain',
    diagnoses: 10,
    models: [marra],
    scenarios: [
      { finding: 'finding-usb-socket', weight: 2, complaints: drain, clue: 'USB socket LED stays lit with the key out.', repair: 'USB socket moved to the switched accessory feed; draw down to 3 mA.', parts: 'Butt connectors ×3; wire 0.6 m', labour: [45, 80] },
      { finding: 'finding-grip-controller', weight: 2, complaints: drain, clue: 'Heated grip controller warm with the key out.', repair: 'Heated grip controller draws with the key off; replaced and fed through the accessory relay.', parts: 'Heated grip controller', labour: [40, 70] },
      { finding: 'finding-tracker', weight: 2, complaints: drain, clue: 'Tracker pings the network every few minutes.', repair: 'Tracker set to its sleep mode with the owner’s app; draw drops to 4 mA when idle.', parts: '—', labour: [30, 50] },
      { finding: 'finding-module-awake', weight: 1, complaints: drain, clue: 'ECU fuse out drops the draw: a module stays awake.', repair: 'Instrument cluster kept the ECU awake; cluster replaced under recall notice from the importer.', parts: 'Instrument cluster', labour: [60, 90] },
      { finding: 'finding-rectifier-leak', weight: 2, complaints: drain, clue: 'Draw vanishes with the regulator unplugged.', repair: 'Regulator/rectifier leaking back to the stator; replaced, draw now 2.5 mA.', parts: 'Regulator/rectifier', labour: [35, 60] },
      { finding: 'finding-battery-worn', weight: 1, complaints: drain, clue: 'Draw normal after the ECU sleeps; battery self-discharging.', repair: 'Battery self-discharges overnight; replaced. Parked draw normal at 2.6 mA.', parts: 'Battery 12 V 10 Ah', labour: [15, 30] },
    ],
  },
  {
    procedure: 'headlight',
    diagnoses: 10,
    models: [fell450, fell570],
    scenarios: [
      { finding: 'finding-bulb', weight: 4, complaints: dark, clue: 'Low-beam filament broken.', repair: 'Headlight bulb replaced, beam aimed.', parts: 'Headlight bulb 12 V 35/35 W', labour: [10, 25] },
      { finding: 'finding-fuse-blown', weight: 1, complaints: dark, clue: 'HEAD fuse blown; no short found downstream.', repair: 'Fuse replaced; wiring checked along the bars, no chafe found. Lights tested for 20 minutes.', parts: 'Fuse 15 A', labour: [15, 30] },
      { finding: 'finding-short-to-ground', weight: 1, complaints: dark, clue: 'Headlight feed reads low to ground with the bulb out.', repair: 'Feed wire pinched under the front rack; insulation repaired, wire re-routed.', parts: 'Heat shrink; loom 0.3 m', labour: [45, 80] },
      { finding: 'finding-connector', weight: 2, complaints: dark, clue: 'Connector pins green, one pushed back.', repair: 'Headlight connector replaced with a sealed one; pins greased.', parts: 'Sealed 3-pin connector', labour: [30, 50] },
      { finding: 'finding-ground-eyelet', weight: 1, complaints: dark, clue: 'Ground eyelet loose on the frame tab.', repair: 'Ground eyelet cleaned, new bolt and star washer.', parts: 'Star washer; M6 bolt', labour: [15, 30] },
      { finding: 'finding-dimmer-switch', weight: 1, complaints: dark, clue: 'Dimmer switch open on low beam.', repair: 'Left switch cleaned inside; contacts pitted so the switch was replaced.', parts: 'Left handlebar switch', labour: [35, 60] },
    ],
  },
];
