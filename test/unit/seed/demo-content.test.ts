import { describe, expect, it } from 'vitest';
import { decideStep, type PathSoFar } from '@shared/diagnosis/decide-step';
import type { MeasureCheck } from '@shared/engine/procedure';
import { parseProcedureDocument } from '@shared/engine/procedure-schema';
import { QUANTITY_INFO } from '@shared/engine/quantity';
import { validateProcedure } from '@shared/engine/validate-procedure';
import { checkVin } from '@shared/engine/vin';
import { jobSchema, machineSchema, meterSchema } from '@shared/workshop/schemas';
import { DEMO_DIAGNOSES, replayDiagnosis } from '@server/seed/demo-workshop/diagnoses';
import { DEMO_JOBS } from '@server/seed/demo-workshop/machines-and-jobs';
import { DEMO_METERS } from '@server/seed/demo-workshop/meters';
import { DEMO_PROCEDURES, currentDocument } from '@server/seed/demo-workshop/procedures';
import { CAUTION } from '@server/seed/demo-workshop/procedures/cautions';

/**
 * The demo shop's content is invented; these tests hold it to the product's own rules (validateProcedure,
 * the document schema, decideStep) rather than to outside values. Where a rule comes from outside it is named.
 */

const versions = DEMO_PROCEDURES.flatMap((p) => p.versions.map((v, i) => [`${p.key} #${i + 1} (${v.status})`, v.document] as const));
const measureChecks = (doc: (typeof versions)[number][1]) => doc.checks.filter((c): c is MeasureCheck => c.kind === 'measure');

describe('demo procedures', () => {
  it('has at least five procedures with a published version of 10–30 checks', () => {
    const published = DEMO_PROCEDURES.filter((p) => p.versions.some((v) => v.status === 'published'));
    expect(published.length).toBeGreaterThanOrEqual(5);
    for (const p of published) {
      const n = currentDocument(p.key).checks.length;
      expect(n, p.key).toBeGreaterThanOrEqual(10);
      expect(n, p.key).toBeLessThanOrEqual(30);
    }
  });

  it('keeps a version history: a retired version, later versions and a draft', () => {
    const statuses = DEMO_PROCEDURES.map((p) => p.versions.map((v) => v.status).join(','));
    expect(statuses).toContain('retired,published');
    expect(statuses.some((s) => s.endsWith(',draft'))).toBe(true);
  });

  it.each(versions)('%s passes validateProcedure with zero problems', (_name, doc) => {
    expect(validateProcedure(doc)).toEqual([]);
  });

  it.each(versions)('%s fits the stored document schema', (_name, doc) => {
    const parsed = parseProcedureDocument(doc);
    expect(parsed.ok ? [] : parsed.errors).toEqual([]);
  });

  it.each(versions)('%s: every spec is in the unit of its check’s quantity, with a fitting meter function', (_name, doc) => {
    for (const c of measureChecks(doc)) {
      const info = QUANTITY_INFO[c.quantity];
      if (c.spec.kind !== 'ratio' && c.spec.kind !== 'record_only') expect(c.spec.unit, c.id).toBe(info.symbol);
      if ('copperAt20C' in c.spec && c.spec.copperAt20C) expect(info.dimension, c.id).toBe('resistance');
      if (c.meterFunction !== undefined) expect(info.meterFunctions, c.id).toContain(c.meterFunction);
    }
  });

  it.each(versions)('%s: every winding resistance window is marked as copper at 20 °C', (_name, doc) => {
    for (const c of measureChecks(doc)) {
      if (c.quantity === 'resistance' && c.spec.kind === 'window') expect(c.spec.copperAt20C, c.id).toBe(true);
    }
  });

  it.each(versions)('%s: starts with cautions and puts them on the checks that need them', (_name, doc) => {
    expect(doc.cautions).toContain(CAUTION.manualFirst);
    expect(doc.cautions.length).toBeGreaterThanOrEqual(3);
    for (const c of measureChecks(doc)) {
      // Resistance and diode readings are taken unpowered (common practice).
      if (QUANTITY_INFO[c.quantity].opensOnOverRange) expect(c.cautions, c.id).toContain(CAUTION.powerOffOhms);
      // An ammeter goes in series only (common practice).
      if (c.quantity === 'current_dc') expect(c.cautions, c.id).toContain(CAUTION.ammeterSeries);
    }
    for (const c of doc.checks) {
      if (/spark tester/i.test(c.instruction)) expect(c.cautions, c.id).toEqual(expect.arrayContaining([CAUTION.highVoltage, CAUTION.fuelVapour]));
      if (/\bcrank (and|for)\b/i.test(c.instruction)) expect(c.cautions, c.id).toContain(CAUTION.cranking);
    }
  });

  it('uses a marginal re-measure loop with a visit limit somewhere', () => {
    const loops = DEMO_PROCEDURES.flatMap((p) => measureChecks(currentDocument(p.key))).filter((c) => c.marginalPolicy === 'branch' && c.retest && c.outcomes.marginal);
    expect(loops.length).toBeGreaterThanOrEqual(1);
  });

  it('pairs every both-ways diode reading with a forward reading of the same quantity', () => {
    for (const p of DEMO_PROCEDURES) {
      const doc = currentDocument(p.key);
      for (const c of measureChecks(doc)) {
        if (c.spec.kind !== 'ratio') continue;
        const pairWith = c.spec.pairWith;
        const forward = doc.checks.find((x) => x.id === pairWith);
        expect(forward?.kind, c.id).toBe('measure');
        expect((forward as MeasureCheck).quantity).toBe(c.quantity);
      }
    }
  });
});

describe('demo meters', () => {
  it.each(DEMO_METERS.map((m) => [m.name, m] as const))('%s fits the meter schema, one count = range / display counts', (_name, m) => {
    expect(() => meterSchema.validateSync(m, { strict: false })).not.toThrow();
    // A 6000-count meter shows 0–5999 on every range, a 4000-count one 0–3999 — except where meter tables
    // stop short of the display: the diode range (limited by its test voltage) and the fused 10 A range.
    const display = m.model.includes('6000') ? 6000 : 4000;
    for (const r of m.ranges) {
      if (r.function === 'diode' || (r.function === 'dc_amps' && r.rangeMax === 10)) continue;
      expect(Math.round(r.rangeMax / r.resolution), `${r.function} ${r.rangeMax}`).toBe(display);
    }
  });
});

describe('demo machines and jobs', () => {
  it.each(DEMO_JOBS.map((j) => [j.key, j] as const))('%s fits the machine and job schemas', (_key, j) => {
    expect(() => machineSchema.validateSync(j.machine)).not.toThrow();
    expect(() => jobSchema.validateSync({ ...j, machineId: '00000000-0000-4000-8000-000000000000' })).not.toThrow();
  });

  it('gives every VIN 17 characters and the correct North American check digit (49 CFR 565)', () => {
    const vins = DEMO_JOBS.map((j) => j.machine.vin).filter((v) => v !== '');
    expect(vins.length).toBeGreaterThanOrEqual(5);
    for (const vin of vins) {
      const checked = checkVin(vin);
      expect(checked.ok, vin).toBe(true);
      expect(checked.ok && checked.warning, vin).toBeFalsy();
    }
  });
});

describe('demo diagnoses', () => {
  it('has three concluded diagnoses and one open one', () => {
    expect(DEMO_DIAGNOSES.filter((d) => d.conclusion).length).toBe(3);
    expect(DEMO_DIAGNOSES.filter((d) => !d.conclusion).length).toBe(1);
    expect(DEMO_DIAGNOSES.some((d) => d.steps.some((s) => s.retractedAtMin !== undefined))).toBe(true);
  });

  it.each(DEMO_DIAGNOSES.map((d) => [d.key, d] as const))('%s replays through decideStep to its recorded finding', (_key, d) => {
    const doc = currentDocument(d.procedure);
    const ranges = DEMO_METERS.find((m) => m.key === d.meter)!.ranges;
    // Walk the script with decideStep directly, as the server does: retracted steps leave the path.
    const path: PathSoFar[number][] = [];
    let current = doc.startCheckId;
    for (const s of d.steps) {
      expect(s.checkId).toBe(current);
      const decision = decideStep(doc, s.checkId, { reading: s.reading, choiceId: s.choiceId }, { meterRanges: ranges, ambientC: d.ambientC, path });
      if (!decision.ok) throw new Error(decision.message);
      if (s.expect) expect(decision.verdict, `${s.checkId} ${s.reading}`).toBe(s.expect);
      if (s.retractedAtMin !== undefined) continue;
      path.push({ checkId: s.checkId, value: decision.value, overRange: decision.overRange, uncertainty: decision.evaluation?.uncertainty });
      current = decision.nextCheckId;
    }
    if (d.conclusion) {
      expect(current).toBe(d.conclusion.findingCheckId);
      expect(doc.checks.find((c) => c.id === current)?.kind).toBe('finding');
    } else {
      expect(current).toBe(d.waitingAt);
      expect(doc.checks.find((c) => c.id === current)?.kind).not.toBe('finding');
    }
    // The seed's own replay agrees.
    expect(replayDiagnosis(doc, d, ranges).currentCheckId).toBe(current);
  });

  it('keeps steps in time order and concludes after the last step', () => {
    for (const d of DEMO_DIAGNOSES) {
      const times = d.steps.map((s) => s.atMin);
      expect([...times].sort((a, b) => a - b)).toEqual(times);
      if (d.conclusion) expect(d.conclusion.atMin).toBeGreaterThan(times.at(-1)!);
    }
  });
});
