import { describe, expect, it } from 'vitest';
import { pathSoFar, type RecordedStep } from '@shared/diagnosis/path-so-far';
import { decideStep } from '@shared/diagnosis/decide-step';
import { checkVin } from '@shared/engine/vin';
import { jobSchema, machineSchema } from '@shared/workshop/schemas';
import { replayDiagnosis } from '@server/seed/demo-workshop/diagnoses';
import { PROCEDURE_SCENARIOS } from '@server/seed/demo-workshop/fault-scenarios';
import {
  DEMO_SEED,
  GENERATED_DAYS,
  REMEASURE_MINUTES,
  RETRACT_MINUTES,
  SETUP_MINUTES,
  generateDemoDiagnoses,
  stepMinutesRange,
} from '@server/seed/demo-workshop/generate-diagnoses';
import { DEMO_METERS } from '@server/seed/demo-workshop/meters';
import { DEMO_PROCEDURES } from '@server/seed/demo-workshop/procedures';

/** The generated demo diagnoses: the same every time, and true to the engine and to the bench. */

const generated = generateDemoDiagnoses();
const documentOf = (d: (typeof generated.diagnoses)[number]) =>
  DEMO_PROCEDURES.find((p) => p.key === d.procedure)!.versions.filter((v) => v.status !== 'draft')[d.version! - 1].document;
const rangesOf = (d: (typeof generated.diagnoses)[number]) => DEMO_METERS.find((m) => m.key === d.meter)!.ranges;
const cases = generated.diagnoses.map((d) => [d.key, d] as const);

describe('generated demo diagnoses', () => {
  it('are the same for the same seed and differ for another', () => {
    expect(generateDemoDiagnoses(DEMO_SEED)).toEqual(generated);
    expect(generateDemoDiagnoses(DEMO_SEED + 1)).not.toEqual(generated);
  });

  it('are dozens, as many per procedure as the scenarios ask, each with its own job', () => {
    expect(generated.diagnoses.length).toBe(PROCEDURE_SCENARIOS.reduce((n, g) => n + g.diagnoses, 0));
    expect(generated.diagnoses.length).toBeGreaterThanOrEqual(40);
    expect(generated.diagnoses.length).toBeLessThanOrEqual(80);
    for (const g of PROCEDURE_SCENARIOS) expect(generated.diagnoses.filter((d) => d.procedure === g.procedure).length).toBe(g.diagnoses);
    expect(new Set(generated.diagnoses.map((d) => d.job)).size).toBe(generated.diagnoses.length);
    expect(generated.jobs.map((j) => j.key).sort()).toEqual(generated.diagnoses.map((d) => d.job).sort());
  });

  it.each(cases)('%s walks through decideStep to a finding of its procedure version and is concluded there', (_key, d) => {
    const doc = documentOf(d);
    const recorded: RecordedStep[] = [];
    let current = doc.startCheckId;
    for (const s of d.steps) {
      expect(s.checkId).toBe(current);
      const decision = decideStep(doc, s.checkId, { reading: s.reading, choiceId: s.choiceId }, { meterRanges: rangesOf(d), ambientC: d.ambientC, path: pathSoFar(recorded) });
      if (!decision.ok) throw new Error(decision.message);
      recorded.push({ checkId: s.checkId, valueSi: decision.value, overRange: decision.overRange, retracted: s.retractedAtMin !== undefined, evaluation: decision.evaluation });
      if (s.retractedAtMin === undefined) current = decision.nextCheckId;
    }
    expect(d.conclusion?.findingCheckId).toBe(current);
    expect(doc.checks.find((c) => c.id === current)?.kind).toBe('finding');
    // The seed records exactly what the engine decides, and agrees on where it ends.
    expect(replayDiagnosis(doc, d, rangesOf(d)).currentCheckId).toBe(current);
  });

  it.each(cases)('%s takes as long at each step as its kind of check does (estimates, no source)', (_key, d) => {
    const doc = documentOf(d);
    let previous = 0;
    let retractedAt: number | null = null;
    d.steps.forEach((s, i) => {
      const [min, max] = stepMinutesRange(doc.checks.find((c) => c.id === s.checkId)!);
      const gap = s.atMin - (retractedAt ?? previous);
      if (retractedAt !== null) {
        expect(gap, s.checkId).toBeGreaterThanOrEqual(REMEASURE_MINUTES[0]);
        expect(gap, s.checkId).toBeLessThanOrEqual(REMEASURE_MINUTES[1]);
      } else if (i === 0) {
        expect(gap).toBeGreaterThanOrEqual(SETUP_MINUTES[0] + min);
        expect(gap).toBeLessThanOrEqual(SETUP_MINUTES[1] + max);
      } else {
        expect(gap, s.checkId).toBeGreaterThanOrEqual(min);
        expect(gap, s.checkId).toBeLessThanOrEqual(max);
      }
      retractedAt = null;
      if (s.retractedAtMin !== undefined) {
        expect(s.retractedAtMin - s.atMin).toBeGreaterThanOrEqual(RETRACT_MINUTES[0]);
        expect(s.retractedAtMin - s.atMin).toBeLessThanOrEqual(RETRACT_MINUTES[1]);
        retractedAt = s.retractedAtMin;
      }
      previous = s.atMin;
    });
    const scenario = PROCEDURE_SCENARIOS.flatMap((g) => g.scenarios).find((s) => s.finding === d.conclusion!.findingCheckId && s.repair === d.conclusion!.note)!;
    expect(d.conclusion!.labourMinutes).toBeGreaterThanOrEqual(scenario.labour[0] - 5);
    expect(d.conclusion!.labourMinutes).toBeLessThanOrEqual(scenario.labour[1] + 5);
    expect(d.conclusion!.atMin).toBeGreaterThan(previous + d.conclusion!.labourMinutes);
  });

  it('reads in and out of spec, some marginal, some retracted and measured again, with notes', () => {
    const verdicts = new Map<string, number>();
    let retracted = 0;
    let noted = 0;
    for (const d of generated.diagnoses) {
      for (const s of replayDiagnosis(documentOf(d), d, rangesOf(d)).steps) {
        if (s.verdict) verdicts.set(s.verdict, (verdicts.get(s.verdict) ?? 0) + 1);
        if (s.retractedAtMin !== null) retracted++;
        if (s.note) noted++;
      }
    }
    expect(verdicts.get('in_spec')).toBeGreaterThan(50);
    for (const v of ['low', 'high', 'open', 'marginal']) expect(verdicts.get(v), v).toBeGreaterThanOrEqual(5);
    expect(retracted).toBeGreaterThanOrEqual(3);
    expect(noted).toBeGreaterThanOrEqual(generated.diagnoses.length);
  });

  it('reaches most of each procedure’s scenario findings', () => {
    for (const g of PROCEDURE_SCENARIOS) {
      const reached = new Set(generated.diagnoses.filter((d) => d.procedure === g.procedure).map((d) => d.conclusion!.findingCheckId));
      expect(reached.size, g.procedure).toBeGreaterThanOrEqual(Math.min(4, g.scenarios.length));
    }
  });

  it('spreads the work over the last six weeks and three technicians, nobody running two at once', () => {
    const days = generated.diagnoses.map((d) => ('daysAgo' in d.start ? d.start.daysAgo : -1));
    expect(Math.min(...days)).toBeGreaterThanOrEqual(GENERATED_DAYS[0]);
    expect(Math.max(...days)).toBeLessThanOrEqual(GENERATED_DAYS[1]);
    expect(Math.max(...days) - Math.min(...days)).toBeGreaterThanOrEqual(28);
    expect(new Set(generated.diagnoses.map((d) => d.by))).toEqual(new Set(['owner', 'lead', 'tech']));
    const spans = generated.diagnoses.map((d) => {
      const s = d.start as { daysAgo: number; hour: number; minute: number };
      const start = -s.daysAgo * 24 * 60 + s.hour * 60 + s.minute;
      expect(s.hour * 60 + s.minute).toBeGreaterThanOrEqual(8 * 60);
      expect(s.hour * 60 + s.minute).toBeLessThanOrEqual(16 * 60);
      return { by: d.by, start, end: start + d.conclusion!.atMin };
    });
    for (const a of spans) for (const b of spans) if (a !== b && a.by === b.by) expect(a.end <= b.start || b.end <= a.start).toBe(true);
  });

  it('runs the procedure version that was in force on the day', () => {
    const starter = DEMO_PROCEDURES.find((p) => p.key === 'starter')!;
    const retiredDaysAgo = starter.versions[0].retiredDaysAgo!;
    const onStarter = generated.diagnoses.filter((d) => d.procedure === 'starter');
    for (const d of onStarter) expect(d.version).toBe((d.start as { daysAgo: number }).daysAgo > retiredDaysAgo ? 1 : 2);
    expect(new Set(onStarter.map((d) => d.version)).size).toBe(2);
  });

  it.each(generated.jobs.map((j) => [j.key, j] as const))('%s: machine and job fit their schemas; the VIN carries its check digit (49 CFR 565)', (_key, j) => {
    expect(() => machineSchema.validateSync(j.machine)).not.toThrow();
    expect(() => jobSchema.validateSync({ ...j, machineId: '00000000-0000-4000-8000-000000000000' })).not.toThrow();
    const checked = checkVin(j.machine.vin);
    expect(checked.ok && !checked.warning, j.machine.vin).toBe(true);
  });
});
