import type { Role } from '@shared/auth/roles';
import { decideStep, type StepDecision } from '@shared/diagnosis/decide-step';
import { pathSoFar, type RecordedStep } from '@shared/diagnosis/path-so-far';
import type { Check, MeasureCheck, ProcedureDocument } from '@shared/engine/procedure';
import type { Verdict } from '@shared/engine/verdict';
import { formatValue } from '@shared/engine/units';
import { vinCheckDigit } from '@shared/engine/vin';
import { nextCheckId } from '@shared/engine/walk';
import { between, pick, pickWeighted, seededRandom, wholeBetween, type Random } from '@shared/random/seeded-random';
import type { DemoDiagnosis, ScriptStep } from './diagnoses';
import { PROCEDURE_SCENARIOS, type DemoModel, type FaultScenario } from './fault-scenarios';
import type { DemoJob } from './machines-and-jobs';
import { DEMO_METERS, type DemoMeterKey } from './meters';
import { DEMO_PROCEDURES, type DemoProcedureKey } from './procedures';

/**
 * Demo content made by walking the demo procedures with the engine: each diagnosis takes an invented fault
 * (fault-scenarios.ts) and, at every check, picks the observation or draws the reading that leads on towards
 * that fault's finding; `decideStep` judges every drawn reading, and only one that takes the walk where the
 * fault would is kept. Readings are typed the way technicians type them, a few land near a limit, a few are
 * mistyped and taken back. Each step takes as long as its kind of check does, and the diagnoses are spread
 * over the last six weeks and the shop's technicians without anyone running two at once. The same seed
 * always gives the same content; the seed then records it through `replayDiagnosis` like the hand-written
 * stories.
 */

export const DEMO_SEED = 20_260_512;

/** The demo shop's working day, minutes after midnight. */
const DAY_START = 8 * 60;
const DAY_END = 18 * 60;
/** Generated diagnoses start between these many days before seeding. */
export const GENERATED_DAYS = [2, 42] as const;
/** Minutes of setting up before the first check (seat, side covers, meter). */
export const SETUP_MINUTES = [3, 12] as const;
/** Minutes between a mistaken step and taking it back, and between that and measuring again. */
export const RETRACT_MINUTES = [1, 2] as const;
export const REMEASURE_MINUTES = [1, 4] as const;

const RUNNERS: readonly { role: Role; weight: number }[] = [
  { role: 'tech', weight: 6 },
  { role: 'lead', weight: 3 },
  { role: 'owner', weight: 1 },
];

/** Days the hand-written stories keep a technician busy; generated work keeps off them. */
const BUSY_DAYS: readonly { role: Role; daysAgo: number }[] = [
  { role: 'lead', daysAgo: 16 },
  { role: 'tech', daysAgo: 9 },
  { role: 'tech', daysAgo: 8 },
  { role: 'tech', daysAgo: 7 },
  { role: 'tech', daysAgo: 4 },
];

/**
 * How long a check takes at the bench, in minutes. A reading at a connector's pins means unplugging or
 * back-probing it; an ammeter goes in series; AC and cranking readings are taken more than once.
 * Estimates from workshop habit, no source.
 */
export function stepMinutesRange(check: Check): readonly [number, number] {
  switch (check.kind) {
    case 'observe':
      return [2, 6];
    case 'task':
      return TASK_MINUTES[check.id] ?? [5, 15];
    case 'finding':
      return [0, 0];
    case 'measure': {
      const atPins = (check.probe?.pins?.length ?? 0) > 0;
      switch (check.quantity) {
        case 'current_dc':
        case 'current_ac':
          return [6, 15];
        case 'voltage_ac':
          return [4, 10];
        case 'resistance':
        case 'continuity':
        case 'diode':
          return atPins ? [5, 12] : [3, 8];
        default:
          return atPins ? [4, 10] : [2, 5];
      }
    }
  }
}

/** Tasks of the demo procedures that take longer than a few minutes. */
const TASK_MINUTES: Readonly<Record<string, readonly [number, number]>> = {
  'charge-battery': [45, 120],
  'remove-surface-charge': [3, 6],
  'replace-cdi': [20, 45],
  'replace-regulator': [25, 50],
  'wait-sleep': [10, 20],
  'draw-setup': [10, 25],
};

const MEASURE_NOTES = [
  'Leads nulled first.',
  'Back-probed through the seal; seal undamaged.',
  'Reading steady for half a minute.',
  'Wiggled the harness while watching the meter: no change.',
  'Checked the meter on a known good battery first.',
];
const OBSERVE_NOTES = ['Checked twice to be sure.', 'Same result with the other key.'];
const SLIP_NOTE = 'Re-measured: typed the decimal point in the wrong place.';
const PROBE_SLIP_NOTE = 'Re-measured: the probe slipped off the pin the first time.';

const FIRST_NAMES = ['Alma', 'Bertil', 'Cato', 'Delphine', 'Emrys', 'Farah', 'Gideon', 'Hollis', 'Isolde', 'Jory', 'Kasimir', 'Linnea', 'Mabyn', 'Nils', 'Orla', 'Piran', 'Quilla', 'Rowan', 'Saoirse', 'Tobin', 'Ulla', 'Vesna', 'Wilf', 'Yara'];
const LAST_NAMES = ['Ashgrove', 'Brennock', 'Caddow', 'Dunmere', 'Elsworth', 'Fairlie', 'Garrow', 'Hathersage', 'Inchley', 'Jessop', 'Kettleby', 'Lanyon', 'Moorcroft', 'Nancarrow', 'Oakhurst', 'Penrose', 'Quarrie', 'Rosewarne', 'Stainforth', 'Trevanion'];
/** Model-year letters of the tenth VIN character (49 CFR 565). */
const YEAR_LETTERS: Readonly<Record<number, string>> = { 2012: 'C', 2013: 'D', 2014: 'E', 2015: 'F', 2016: 'G', 2017: 'H', 2018: 'J', 2019: 'K', 2020: 'L', 2021: 'M', 2022: 'N', 2023: 'P' };

export interface GeneratedWorkshop {
  jobs: DemoJob[];
  diagnoses: DemoDiagnosis[];
}

export function generateDemoDiagnoses(seed: number = DEMO_SEED): GeneratedWorkshop {
  const random = seededRandom(seed);
  const busy = new Map<string, [number, number][]>();
  for (const b of BUSY_DAYS) busy.set(`${b.role}:${b.daysAgo}`, [[0, 24 * 60]]);
  const drafts: { job: Omit<DemoJob, 'key' | 'reference'>; diagnosis: Omit<DemoDiagnosis, 'key' | 'job'>; order: number }[] = [];

  for (const group of PROCEDURE_SCENARIOS) {
    for (let n = 0; n < group.diagnoses; n++) {
      const daysAgo = wholeBetween(random, GENERATED_DAYS[0], GENERATED_DAYS[1]);
      const version = versionInForce(group.procedure, daysAgo);
      const document = version.document;
      const scenarios = group.scenarios.filter((s) => document.checks.some((c) => c.id === s.finding && c.kind === 'finding'));
      const scenario = pickWeighted(random, scenarios, (s) => s.weight);
      const ambientC = wholeBetween(random, 6, 24);
      // The pocket meter cannot resolve every check (a 0.5 Ω continuity limit is inside its uncertainty):
      // where it cannot take the walk on, the technician fetches the bench meter and starts again.
      const pocket = random() < 0.3 ? walkTo(document, scenario, 'pocket', ambientC, random) : null;
      const meter: DemoMeterKey = pocket && typeof pocket !== 'string' ? 'pocket' : 'bench';
      const walk = meter === 'pocket' ? (pocket as Walk) : walkTo(document, scenario, 'bench', ambientC, random);
      if (typeof walk === 'string') throw new Error(walk);
      const by = pickWeighted(random, RUNNERS, (r) => r.weight).role;
      const { daysAgo: day, startMin } = schedule(busy, by, daysAgo, walk.conclusion.atMin, (d) => versionInForce(group.procedure, d).number === version.number, random);
      const model = pick(random, group.models);
      const bookedMin = Math.max(DAY_START - 30, startMin - wholeBetween(random, 15, 90));
      drafts.push({
        order: day * 24 * 60 - startMin,
        job: {
          machine: machineOf(model, day, random),
          ...customer(random),
          complaint: pick(random, scenario.complaints),
          booked: { daysAgo: day, hour: Math.floor(bookedMin / 60), minute: bookedMin % 60 },
        },
        diagnosis: {
          procedure: group.procedure,
          version: version.number,
          meter,
          by,
          ambientC,
          start: { daysAgo: day, hour: Math.floor(startMin / 60), minute: startMin % 60 },
          steps: walk.steps,
          conclusion: walk.conclusion,
        },
      });
    }
  }

  // Work orders are numbered in the order they were booked.
  drafts.sort((a, b) => b.order - a.order);
  const jobs: DemoJob[] = [];
  const diagnoses: DemoDiagnosis[] = [];
  drafts.forEach((d, i) => {
    const key = `generated-${i + 1}` as const;
    jobs.push({ key, reference: `WO-${2201 + i}`, ...d.job });
    diagnoses.push({ key, job: key, ...d.diagnosis });
  });
  return { jobs, diagnoses };
}

/** The version a diagnosis started this many days ago ran: the one published then and not yet retired. */
function versionInForce(key: DemoProcedureKey, daysAgo: number): { number: number; document: ProcedureDocument } {
  const numbered = DEMO_PROCEDURES.find((p) => p.key === key)!
    .versions.filter((v) => v.status !== 'draft')
    .map((v, i) => ({ ...v, number: i + 1 }));
  const inForce = numbered.filter((v) => v.daysAgo >= daysAgo && (v.retiredDaysAgo === undefined || v.retiredDaysAgo < daysAgo)).at(-1);
  if (!inForce) throw new Error(`No version of “${key}” was in force ${daysAgo} days ago.`);
  return inForce;
}

/**
 * The earliest start, on the drawn day or the next one with room, when the technician is free for the whole
 * diagnosis; only days when the same procedure version was in force, so the walk still holds.
 */
function schedule(busy: Map<string, [number, number][]>, by: Role, daysAgo: number, minutes: number, sameVersion: (day: number) => boolean, random: Random): { daysAgo: number; startMin: number } {
  const span = GENERATED_DAYS[1] - GENERATED_DAYS[0] + 1;
  for (let shift = 0; shift < span; shift++) {
    const day = GENERATED_DAYS[0] + ((daysAgo - GENERATED_DAYS[0] + shift) % span);
    if (!sameVersion(day)) continue;
    const taken = busy.get(`${by}:${day}`) ?? [];
    const start = taken.reduce((latest, [, end]) => Math.max(latest, end), DAY_START) + wholeBetween(random, 5, 40);
    // Nobody starts a diagnosis after four; one that waits on a battery charger may run into the evening.
    if (start > 16 * 60 || start + Math.min(minutes, 4 * 60) > DAY_END) continue;
    busy.set(`${by}:${day}`, [...taken, [start, start + minutes]]);
    return { daysAgo: day, startMin: start };
  }
  throw new Error(`No free day for ${by} in the last ${GENERATED_DAYS[1]} days.`);
}

interface Walk {
  steps: ScriptStep[];
  conclusion: NonNullable<DemoDiagnosis['conclusion']>;
}

/** Walks the procedure from its start to the scenario's finding, one decided step at a time. */
function walkTo(document: ProcedureDocument, scenario: FaultScenario, meter: DemoMeterKey, ambientC: number, random: Random): Walk | string {
  const distance = distancesTo(document, scenario.finding);
  const meterRanges = DEMO_METERS.find((m) => m.key === meter)!.ranges;
  const byId = new Map(document.checks.map((c) => [c.id, c]));
  const recorded: RecordedStep[] = [];
  const steps: ScriptStep[] = [];
  let current = document.startCheckId;
  let at = wholeBetween(random, ...SETUP_MINUTES);
  const fail = (message: string) => `Generated diagnosis towards “${scenario.finding}” with the ${meter} meter, at “${current}”: ${message}`;

  while (byId.get(current)!.kind !== 'finding') {
    if (steps.length > 40) return fail('the walk does not reach the finding.');
    const check = byId.get(current)!;
    const ctx = { meterRanges, ambientC, path: pathSoFar(recorded) };
    const visits = (id: string) => recorded.filter((s) => !s.retracted && s.checkId === id).length + (id === check.id ? 1 : 0);
    const decideWith = (input: { reading?: string; choiceId?: string }) => decideStep(document, check.id, input, ctx);
    let input: { reading?: string; choiceId?: string } = {};
    let decision: Extract<StepDecision, { ok: true }>;
    let note = '';

    at += wholeBetween(random, ...stepMinutesRange(check));
    if (check.kind === 'measure') {
      const drawn = drawReading(check, document, decideWith, distance, visits, random);
      if (!drawn) return fail('no reading leads towards the finding.');
      const mistake = random() < 0.08 ? mistakenReading(check, drawn.reading, random) : null;
      const slip = mistake && decideWith({ reading: mistake.reading });
      if (mistake && slip?.ok) {
        const retractedAtMin = at + wholeBetween(random, ...RETRACT_MINUTES);
        steps.push({ checkId: check.id, reading: mistake.reading, atMin: at, retractedAtMin });
        recorded.push({ checkId: check.id, valueSi: slip.value, overRange: slip.overRange, retracted: true, evaluation: slip.evaluation });
        at = retractedAtMin + wholeBetween(random, ...REMEASURE_MINUTES);
        note = mistake.note;
      } else if (random() < 0.15) {
        note = pick(random, MEASURE_NOTES);
      }
      input = { reading: drawn.reading };
      decision = drawn.decision;
    } else if (check.kind === 'observe') {
      const best = bestOf(
        check.choices.map((c) => ({ input: { choiceId: c.id }, decision: decideWith({ choiceId: c.id }) })),
        distance,
        random,
      );
      if (!best) return fail('no observation leads towards the finding.');
      input = best.input;
      decision = best.decision;
      if (random() < 0.1) note = pick(random, OBSERVE_NOTES);
    } else {
      input = {};
      const done = decideWith({});
      if (!done.ok) return fail(done.message);
      decision = done;
    }

    if (byId.get(decision.nextCheckId)!.kind === 'finding') note = note ? `${note} ${scenario.clue}` : scenario.clue;
    steps.push({ checkId: check.id, ...input, ...(note ? { note } : {}), atMin: at });
    recorded.push({ checkId: check.id, valueSi: decision.value, overRange: decision.overRange, retracted: false, evaluation: decision.evaluation });
    current = decision.nextCheckId;
  }
  if (current !== scenario.finding) return fail(`the walk ended at “${current}”.`);

  const labourMinutes = 5 * Math.round(between(random, ...scenario.labour) / 5);
  return {
    steps,
    conclusion: { findingCheckId: current, note: scenario.repair, parts: scenario.parts, labourMinutes, atMin: at + labourMinutes + wholeBetween(random, 5, 20) },
  };
}

type Decide = (input: { reading?: string }) => StepDecision;

/**
 * A reading for a measure check that takes the walk one step closer to the finding, drawn around the limits
 * the engine itself uses for this check (after temperature correction, or from the earlier reading a ratio
 * or agreement compares against). Now and then a marginal reading, or a detour through the check's own
 * "measure again" outcome.
 */
function drawReading(
  check: MeasureCheck,
  document: ProcedureDocument,
  decide: Decide,
  distance: ReadonlyMap<string, number>,
  visits: (id: string) => number,
  random: Random,
): { reading: string; decision: Extract<StepDecision, { ok: true }> } | null {
  const probe = decide({ reading: '1' });
  const limits = probe.ok && probe.evaluation ? probe.evaluation.limits : { min: null, max: null };
  const scale = check.spec.kind === 'ratio' && probe.ok ? (probe.evaluation?.reference ?? 1) : 1;
  const lo = limits.min === null ? null : limits.min * scale;
  const hi = limits.max === null ? null : limits.max * scale;

  const nextFor = (verdict: Verdict) => {
    const walked = nextCheckId(document, check.id, { verdict, leans: null }, visits);
    return walked.ok ? walked.next : null;
  };
  const verdicts = (Object.keys(check.outcomes) as Verdict[]).filter((v) => v !== 'marginal' && v !== 'no_reading');
  const closest = Math.min(...verdicts.map((v) => distance.get(nextFor(v) ?? '') ?? Infinity));
  if (!Number.isFinite(closest)) return null;
  const aims = verdicts.filter((v) => (distance.get(nextFor(v) ?? '') ?? Infinity) === closest);
  // A detour returns here, so only while this check may still be visited again.
  const mayReturn = check.retest !== undefined && visits(check.id) < check.retest.maxVisits;
  const detour = check.outcomes.marginal !== undefined && mayReturn && random() < 0.3 ? nextFor('marginal') : null;
  const detourOk = detour !== null && detour !== nextFor(aims[0]) && Number.isFinite(distance.get(detour) ?? Infinity);

  const accept = (reading: string, wantNext: (next: string) => boolean) => {
    const d = decide({ reading });
    return d.ok && wantNext(d.nextCheckId) ? { reading, decision: d } : null;
  };
  const onTheWay = (next: string) => distance.get(next) === closest;

  if (detourOk) {
    const limit = lo ?? hi;
    for (let i = 0; limit !== null && i < 12; i++) {
      const got = accept(typed(check, limit * (1 + between(random, -0.004, 0.004)), random), (next) => next === detour);
      if (got) return got;
    }
  }
  const aim = pick(random, aims);
  for (let i = 0; i < 12; i++) {
    const nearLimit = aim === 'in_spec' && random() < 0.12;
    const value = nearLimit ? (lo ?? hi ?? 1) * (1 + (lo !== null ? 1 : -1) * between(random, 0, 0.006)) : valueFor(check, aim, lo, hi, random);
    const got = accept(value === 'OL' ? 'OL' : typed(check, value, random), onTheWay);
    if (got) return got;
  }
  // The spec is of a shape the draws above miss: try readings across every decade and keep one on the way.
  const grid: string[] = ['OL'];
  for (let e = -80; e <= 140; e++) grid.push(typed(check, 10 ** (e / 20), random));
  const fitting = grid.map((g) => accept(g, onTheWay)).filter((g) => g !== null);
  return fitting.length ? pick(random, fitting) : null;
}

function valueFor(check: MeasureCheck, verdict: Verdict, lo: number | null, hi: number | null, random: Random): number | 'OL' {
  const volts = check.quantity === 'voltage_dc';
  switch (verdict) {
    case 'open':
      return 'OL';
    case 'in_spec':
      if (check.spec.kind === 'expect_open' || (check.spec.kind === 'ratio' && random() < 0.7)) return 'OL';
      if (lo !== null && hi !== null) return lo + (hi - lo) * between(random, 0.2, 0.8);
      if (hi !== null) return hi * between(random, 0.05, 0.6);
      if (lo !== null) return lo * (volts ? between(random, 1.005, 1.045) : between(random, 1.08, 1.5));
      return between(random, 1, 100);
    case 'low':
      if (lo === null) return 0;
      if (check.spec.kind === 'expect_open') return lo * between(random, 0.0005, 0.05);
      return lo * (volts ? between(random, 0.9, 0.985) : between(random, 0.15, 0.8));
    case 'high':
      if (hi === null) return 'OL';
      return hi * (check.quantity === 'continuity' ? between(random, 3, 40) : between(random, 1.3, 4));
    default:
      return 'OL';
  }
}

/** A value typed the way a technician types it: three digits, sometimes a decimal comma or no unit. */
function typed(check: MeasureCheck, value: number, random: Random): string {
  const text = formatValue(value, check.quantity);
  const [number, unit] = text.split(' ');
  const bareUnit = unit.length === 1 || unit === '°C';
  const r = random();
  if (r < 0.15 && bareUnit) return number;
  if (r < 0.25) return `${number.replace('.', ',')} ${unit}`;
  return text;
}

/** What a technician sometimes records first and takes back: a slipped decimal point, or a probe off its pin. */
function mistakenReading(check: MeasureCheck, reading: string, random: Random): { reading: string; note: string } | null {
  if (reading === 'OL') return null;
  if ((check.quantity === 'resistance' || check.quantity === 'continuity') && random() < 0.4) return { reading: 'OL', note: PROBE_SLIP_NOTE };
  const m = /^(\d+)[.,](\d)(\d*)(.*)$/.exec(reading);
  if (!m) return null;
  return { reading: `${m[1]}${m[2]}.${m[3] || '0'}${m[4]}`, note: SLIP_NOTE };
}

/** Of the decided choices, one that leads closest to the finding. */
function bestOf<T extends { decision: StepDecision }>(options: T[], distance: ReadonlyMap<string, number>, random: Random): (T & { decision: Extract<StepDecision, { ok: true }> }) | null {
  const ok = options.filter((o): o is T & { decision: Extract<StepDecision, { ok: true }> } => o.decision.ok && distance.has(o.decision.nextCheckId));
  if (!ok.length) return null;
  const closest = Math.min(...ok.map((o) => distance.get(o.decision.nextCheckId)!));
  return pick(
    random,
    ok.filter((o) => distance.get(o.decision.nextCheckId) === closest),
  );
}

/** Fewest steps from each check to the target finding, over every outcome, choice and re-test exit. */
function distancesTo(document: ProcedureDocument, target: string): Map<string, number> {
  const into = new Map<string, string[]>();
  for (const c of document.checks) {
    const exits =
      c.kind === 'measure' ? Object.values(c.outcomes) : c.kind === 'observe' ? c.choices.map((x) => x.next) : c.kind === 'task' ? [c.next] : [];
    if (c.kind !== 'finding' && c.retest) exits.push(c.retest.whenExhausted);
    for (const e of exits) if (e) into.set(e, [...(into.get(e) ?? []), c.id]);
  }
  const distance = new Map([[target, 0]]);
  const queue = [target];
  while (queue.length) {
    const id = queue.shift()!;
    for (const from of into.get(id) ?? []) {
      if (!distance.has(from)) {
        distance.set(from, distance.get(id)! + 1);
        queue.push(from);
      }
    }
  }
  return distance;
}

function machineOf(model: DemoModel, daysAgo: number, random: Random): DemoJob['machine'] {
  const year = wholeBetween(random, ...model.years);
  const serial = String(wholeBetween(random, 100_000, 399_999));
  const draft = `${model.vinStart}0${YEAR_LETTERS[year]}${model.plant}${serial}`;
  const vin = `${model.vinStart}${vinCheckDigit(draft)}${draft.slice(9)}`;
  const age = Math.max(1, 2026 - year - daysAgo / 365);
  return { make: model.make, model: model.model, year, engine: model.engine, vin, mileage: 10 * Math.round((age * model.kmPerYear * between(random, 0.5, 1.5)) / 10), mileageUnit: 'km' };
}

function customer(random: Random): Pick<DemoJob, 'customerName' | 'customerContact' | 'customerEmail'> {
  const first = pick(random, FIRST_NAMES);
  const last = pick(random, LAST_NAMES);
  return {
    customerName: `${first} ${last}`,
    customerContact: `07700 900${String(wholeBetween(random, 0, 999)).padStart(3, '0')}`,
    customerEmail: random() < 0.8 ? `${first}.${last}@example.com`.toLowerCase() : '',
  };
}
