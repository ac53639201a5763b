import type { DiagnosisDetail, DiagnosisStatus, PhotoView } from '../api/diagnosis-types';
import type { Evaluation } from '../engine/evaluate';
import { explainEvaluation } from '../engine/explain';
import type { Check, MeasureCheck } from '../engine/procedure';
import type { Quantity } from '../engine/quantity';
import type { Verdict } from '../engine/verdict';
import { VERDICT_WORDS } from '../diagnosis/verdict-words';
import { specInWords } from './spec-words';

/**
 * What the customer's report says, built from the diagnosis the API returns, so
 * the report page and the PDF tell the same story in the same words.
 */

/** One check on the path as the report lists it. */
export interface ReportLine {
  /** 1, 2, 3… among the listed checks. */
  number: number;
  stepId: string;
  title: string;
  kind: 'measure' | 'observe' | 'task';
  /** Measure: exactly what was typed; observe: the observation picked; task: "Done". */
  result: string;
  /** The spec in words, for measure checks. */
  spec: string | null;
  verdict: Verdict | null;
  verdictWords: string | null;
  /** One sentence with the numbers behind the verdict. */
  explanation: string | null;
  note: string;
  by: string;
  recordedAt: string;
  /** For drawing the spec bar. */
  measure: { check: MeasureCheck; quantity: Quantity; evaluation: Evaluation } | null;
  photos: PhotoView[];
}

export interface ReportModel {
  status: DiagnosisStatus;
  procedure: string;
  reference: string;
  machine: { title: string; engine: string; vin: string; mileage: string | null };
  customer: { name: string; contact: string; email: string };
  complaint: string;
  lines: ReportLine[];
  /** Steps taken back and measured again: left out of `lines`. */
  retakenCount: number;
  finding: { title: string; part: string; action: string } | null;
  closingNote: string;
  parts: string;
  labour: string | null;
  /** The labour booked, or else the time from start to end. */
  timeSpent: string | null;
  abandonReason: string | null;
  technicians: string[];
  startedAt: string;
  endedAt: string | null;
  /** Photos of the diagnosis as a whole (not of one step). */
  photos: PhotoView[];
}

export const REPORT_TITLE = 'Electrical diagnosis report';

export const SAFETY_NOTE =
  'These are the readings taken on the day, against the specs of the procedure the shop follows. The manufacturer’s service manual, local codes and licensed practice come first; ignition and charging systems carry dangerous voltages, so leave electrical work to a trained technician.';

export function buildReport(d: DiagnosisDetail): ReportModel {
  const checks = new Map<string, Check>(d.document.checks.map((c) => [c.id, c]));
  const live = d.steps.filter((s) => !s.retracted);
  const lines: ReportLine[] = live.map((s, i) => {
    const check = checks.get(s.checkId);
    const photos = d.photos.filter((p) => p.stepId === s.id);
    const base = { number: i + 1, stepId: s.id, title: check?.title ?? s.checkId, note: s.note, by: s.by, recordedAt: s.recordedAt, photos };
    if (check?.kind === 'measure') {
      const evaluation = s.evaluation;
      return {
        ...base,
        kind: 'measure',
        result: s.readingText?.trim() || 'No reading',
        spec: specInWords(check.spec, check.quantity, evaluation),
        verdict: s.verdict,
        verdictWords: s.verdict ? VERDICT_WORDS[s.verdict] : null,
        explanation: evaluation ? explainEvaluation(check.spec, evaluation, check.quantity) : null,
        measure: evaluation ? { check, quantity: check.quantity, evaluation } : null,
      };
    }
    const choice = check?.kind === 'observe' ? check.choices.find((c) => c.id === s.choiceId) : undefined;
    return {
      ...base,
      kind: check?.kind === 'observe' ? 'observe' : 'task',
      result: choice?.label ?? 'Done',
      spec: null,
      verdict: null,
      verdictWords: null,
      explanation: null,
      measure: null,
    };
  });

  const findingCheck = d.conclusion ? checks.get(d.conclusion.findingCheckId) : undefined;
  const { machine } = d.job;
  const labour = d.conclusion?.labourMinutes == null ? null : durationInWords(d.conclusion.labourMinutes);
  return {
    status: d.status,
    procedure: `${d.procedureTitle}, version ${d.versionNumber}`,
    reference: d.job.reference,
    machine: {
      title: `${machine.year} ${machine.make} ${machine.model}`,
      engine: machine.engine,
      vin: machine.vin,
      mileage: machine.mileage === null ? null : `${machine.mileage.toLocaleString('en-GB')} ${machine.mileageUnit}`,
    },
    customer: { name: d.job.customerName, contact: d.job.customerContact, email: d.job.customerEmail },
    complaint: d.job.complaint,
    lines,
    retakenCount: d.steps.length - live.length,
    finding: findingCheck?.kind === 'finding' ? { title: findingCheck.title, ...findingCheck.finding } : null,
    closingNote: d.conclusion?.note ?? '',
    parts: d.conclusion?.parts ?? '',
    labour,
    timeSpent: labour ?? (d.endedAt ? durationInWords(Math.round((Date.parse(d.endedAt) - Date.parse(d.startedAt)) / 60_000)) : null),
    abandonReason: d.abandonReason,
    technicians: [...new Set([d.startedBy, ...live.map((s) => s.by)])],
    startedAt: d.startedAt,
    endedAt: d.endedAt,
    photos: d.photos.filter((p) => p.stepId === null || !live.some((s) => s.id === p.stepId)),
  };
}

/** 95 → "1 h 35 min". */
function durationInWords(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  if (h === 0) return `${m} min`;
  return m === 0 ? `${h} h` : `${h} h ${m} min`;
}
