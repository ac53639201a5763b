import type { Role } from '@shared/auth/roles';
import { decideStep } from '@shared/diagnosis/decide-step';
import { pathSoFar } from '@shared/diagnosis/path-so-far';
import type { Evaluation } from '@shared/engine/evaluate';
import type { ProcedureDocument } from '@shared/engine/procedure';
import type { Verdict } from '@shared/engine/verdict';
import type { MeterRange } from '@shared/workshop/schemas';
import type { DemoMeterKey } from './meters';
import type { DemoProcedureKey } from './procedures';
import type { When } from './time';

/**
 * Demo content: the invented demo shop's diagnoses, written as what the technician typed and picked, step by
 * step. Verdicts, evaluations and next checks are never written here: `replayDiagnosis` runs every step
 * through `decideStep`, exactly as the server does when a step is submitted, and the seed stores what it
 * says. `expect` only states what the story needs, so a change to the engine or a procedure that bends the
 * story stops the seed instead of storing a path that no longer makes sense.
 */

export interface ScriptStep {
  checkId: string;
  /** Exactly what the technician typed, for measure checks. */
  reading?: string;
  /** The observation picked, for observe checks. Tasks take neither. */
  choiceId?: string;
  note?: string;
  /** Minutes after the diagnosis started. */
  atMin: number;
  /** The verdict the story needs (measure checks). */
  expect?: Verdict;
  /** Taken back ("back") this many minutes after the start: kept, marked retracted. */
  retractedAtMin?: number;
}

export interface DemoConclusion {
  findingCheckId: string;
  note: string;
  parts: string;
  labourMinutes: number;
  atMin: number;
}

export interface DemoDiagnosis {
  key: string;
  procedure: DemoProcedureKey;
  /** The procedure version run, by number; the newest published one when absent. */
  version?: number;
  job: string;
  meter: DemoMeterKey;
  by: Role;
  ambientC: number;
  start: When;
  steps: ScriptStep[];
  /** Concluded at a finding; absent for a diagnosis still open. */
  conclusion?: DemoConclusion;
  /** For an open diagnosis: the check it waits at. */
  waitingAt?: string;
}

export const DEMO_DIAGNOSES: readonly DemoDiagnosis[] = [
  {
    key: 'tessa-no-spark',
    procedure: 'no-spark',
    job: 'tessa-no-start',
    meter: 'bench',
    by: 'lead',
    ambientC: 12,
    start: { daysAgo: 16, hour: 9, minute: 10 },
    steps: [
      { checkId: 'spark-test', choiceId: 'none', atMin: 6, note: 'Plugs out, spark testers on both caps: nothing on either side.' },
      { checkId: 'battery-volts', reading: '12.64 V', expect: 'in_spec', atMin: 9 },
      { checkId: 'cdi-supply', reading: '12,41 V', expect: 'in_spec', atMin: 14 },
      { checkId: 'interlock-ground', reading: '0.68 V', expect: 'in_spec', atMin: 19, note: 'Neutral light on.' },
      { checkId: 'sensor-resistance', reading: '0.428k', expect: 'marginal', atMin: 31, note: 'Pins in P-2 are green with corrosion.' },
      { checkId: 'sensor-resistance', reading: '421 ohm', expect: 'in_spec', atMin: 38, note: 'Cleaned the pins with contact cleaner and nulled the leads.' },
      { checkId: 'sensor-to-ground', reading: 'OL', expect: 'in_spec', atMin: 41 },
      { checkId: 'sensor-ac', reading: '3.6 V', expect: 'in_spec', atMin: 49, note: 'Peak adapter, highest of three bursts.' },
      {
        checkId: 'cdi-sensor-ac',
        reading: '0.8 V',
        expect: 'low',
        atMin: 58,
        note: 'Only 0.8 V at the CDI. It jumped to 3.4 V when I turned the bars to the right: the harness shorts somewhere on the left lock.',
      },
    ],
    conclusion: {
      findingCheckId: 'finding-sensor-harness',
      note:
        'Blue/yellow pulse-coil wire chafed through where the harness crosses the frame rail under the tank; it touched the frame on left lock, which is why it died at the lights. Repaired with a solder sleeve, added split loom and re-routed with two ties. Spark on both cylinders, started first press, idled 10 minutes, 8 km test ride with full-lock turns: no cut-out.',
      parts: 'Solder sleeve ×2; split loom 6 mm, 0.4 m; cable ties ×4',
      labourMinutes: 95,
      atMin: 146,
    },
  },
  {
    key: 'fellrunner-not-charging',
    procedure: 'not-charging',
    job: 'fellrunner-flat',
    meter: 'bench',
    by: 'tech',
    ambientC: 18,
    start: { daysAgo: 9, hour: 15, minute: 20 },
    steps: [
      { checkId: 'battery-ocv', reading: '12,21 V', expect: 'low', atMin: 4, note: 'Came in on the trailer; it has not been started since last night.' },
      { checkId: 'charge-battery', atMin: 1045, note: 'On the shop charger overnight. 12.81 V after an hour’s rest, load test passed.' },
      { checkId: 'charging-voltage', reading: '12.38', expect: 'low', atMin: 1062, note: 'Headlights on, 4000 rpm. Voltage sinks slowly: no charge at all.' },
      { checkId: 'stator-res-1', reading: '0.42', expect: 'in_spec', atMin: 1110, note: 'Let it cool for 40 minutes first. Leads nulled.' },
      { checkId: 'stator-res-2', reading: '0.4 Ω', expect: 'in_spec', atMin: 1113 },
      { checkId: 'stator-res-3', reading: '4.1', expect: 'high', atMin: 1116, retractedAtMin: 1118 },
      { checkId: 'stator-res-3', reading: '0.41 ohm', expect: 'in_spec', atMin: 1119, note: 'Typed 4.1 the first time; the meter showed 0.41.' },
      { checkId: 'stator-ground', reading: '2.7k', expect: 'low', atMin: 1125, note: 'Y2 to the case reads 2.7 kΩ; Y1 and Y3 read OL.' },
    ],
    conclusion: {
      findingCheckId: 'finding-stator-grounded',
      note:
        'Stator had two poles burnt black with the insulation broken through to the core. The yellow pins in the regulator plug were brown from heat, so the plug was replaced with a new pigtail too. After the repair: 14.3 V at 4000 rpm with the lights on, stator output 58–61 V AC on all three pairs.',
      parts: 'Stator assembly, 3-phase (NRD-ST570); stator cover gasket; regulator connector pigtail',
      labourMinutes: 165,
      atMin: 4010,
    },
  },
  {
    key: 'marra-drain',
    procedure: 'drain',
    job: 'marra-drain',
    meter: 'bench',
    by: 'tech',
    ambientC: 21,
    start: { daysAgo: 4, hour: 10, minute: 5 },
    steps: [
      { checkId: 'battery-ocv', reading: '12.58 V', expect: 'in_spec', atMin: 3, note: 'Charged on Friday, rested over the weekend.' },
      { checkId: 'draw-setup', atMin: 22, note: 'Started on the 10 A jack; the ECU relay clicked off after about 9 minutes.' },
      { checkId: 'draw-amps', reading: '27.4 mA', expect: 'high', atMin: 24 },
      { checkId: 'fuse-pull', choiceId: 'accessory', atMin: 33, note: 'Only ACCESSORY makes a difference: 27.4 mA down to 2.8 mA.' },
      {
        checkId: 'accessory-loads',
        choiceId: 'usb',
        atMin: 41,
        note: 'The USB socket’s blue LED stays lit with the key out. Someone spliced it into the ACCESSORY feed ahead of the accessory relay.',
      },
    ],
    conclusion: {
      findingCheckId: 'finding-usb-socket',
      note:
        'Moved the USB socket feed to the switched side of the accessory relay, so it is live only with the ignition on. Draw afterwards 2.9 mA. Told the customer the socket was wired that way before she bought the bike.',
      parts: 'Insulated butt connectors ×3; 1.0 mm² wire, 0.6 m; heat shrink',
      labourMinutes: 70,
      atMin: 118,
    },
  },
  {
    key: 'wren-no-crank',
    procedure: 'starter',
    job: 'wren-no-crank',
    meter: 'pocket',
    by: 'tech',
    ambientC: 19,
    start: { minutesAgo: 50 },
    steps: [
      { checkId: 'battery-rest', reading: '12.61', expect: 'in_spec', atMin: 4 },
      { checkId: 'relay-click', choiceId: 'no-click', atMin: 7, note: 'Nothing from the relay with either brake lever.' },
      { checkId: 'relay-coil-supply', reading: '12.2', expect: 'in_spec', atMin: 15 },
      { checkId: 'relay-coil-ground', reading: '11.8 V', expect: 'high', atMin: 21, note: 'Coil minus sits at 11.8 V with the stand up: no ground.' },
    ],
    waitingAt: 'sidestand-switch',
  },
];

/** One step as the server records it. */
export interface ReplayedStep {
  seq: number;
  checkId: string;
  readingText: string | null;
  valueSi: number | null;
  overRange: boolean;
  verdict: Verdict | null;
  choiceId: string | null;
  evaluation: Evaluation | null;
  nextCheckId: string;
  note: string;
  atMin: number;
  retractedAtMin: number | null;
}

export interface Replay {
  steps: ReplayedStep[];
  /** Where the diagnosis stands after the last step. */
  currentCheckId: string;
}

/**
 * Runs a scripted diagnosis through `decideStep` the way the server does: the path handed to each step holds
 * the earlier steps that were not retracted, with the uncertainty of their evaluation; a retracted step
 * leaves the diagnosis at its check. Throws when the script and the engine disagree.
 */
export function replayDiagnosis(document: ProcedureDocument, script: DemoDiagnosis, meterRanges: readonly MeterRange[]): Replay {
  const steps: ReplayedStep[] = [];
  let current = document.startCheckId;
  const fail = (seq: number, message: string): never => {
    throw new Error(`Demo diagnosis “${script.key}”, step ${seq}: ${message}`);
  };
  for (const [i, step] of script.steps.entries()) {
    const seq = i + 1;
    if (step.checkId !== current) fail(seq, `scripted for “${step.checkId}” but the diagnosis is at “${current}”.`);
    const decision = decideStep(document, step.checkId, { reading: step.reading, choiceId: step.choiceId }, {
      meterRanges,
      ambientC: script.ambientC,
      path: pathSoFar(steps.map((s) => ({ ...s, retracted: s.retractedAtMin !== null }))),
    });
    if (!decision.ok) return fail(seq, decision.message);
    if (step.expect !== undefined && decision.verdict !== step.expect) fail(seq, `the story needs ${step.expect} but the engine says ${decision.verdict}.`);
    steps.push({
      seq,
      checkId: step.checkId,
      readingText: step.reading ?? null,
      valueSi: decision.value,
      overRange: decision.overRange,
      verdict: decision.verdict,
      choiceId: decision.choiceId,
      evaluation: decision.evaluation,
      nextCheckId: decision.nextCheckId,
      note: step.note ?? '',
      atMin: step.atMin,
      retractedAtMin: step.retractedAtMin ?? null,
    });
    if (step.retractedAtMin === undefined) current = decision.nextCheckId;
  }
  const expected = script.conclusion?.findingCheckId ?? script.waitingAt;
  if (current !== expected) fail(steps.length, `the path ends at “${current}”, not at “${expected}”.`);
  if (script.conclusion && document.checks.find((c) => c.id === current)?.kind !== 'finding') fail(steps.length, `“${current}” is not a finding.`);
  return { steps, currentCheckId: current };
}
