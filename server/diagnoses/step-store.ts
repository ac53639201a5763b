import crypto from 'node:crypto';
import type Database from 'better-sqlite3';
import type { DataSource } from 'typeorm';
import type { PathSoFar } from '@shared/diagnosis/decide-step';
import { pathSoFar } from '@shared/diagnosis/path-so-far';
import type { Evaluation } from '@shared/engine/evaluate';
import type { ProcedureDocument } from '@shared/engine/procedure';
import type { Verdict } from '@shared/engine/verdict';
import type { MeterRange } from '@shared/workshop/schemas';
import { sqlBool, sqlDate } from '../db/sql-values';
import { sqliteOf } from '../db/writer';

/**
 * Prepared statements for recording a step, the request a technician makes
 * most. Runs inside `ctx.writeSync`. Published versions never change (a
 * database trigger refuses it), so their documents are parsed once and kept.
 */
export interface OpenDiagnosis {
  id: string;
  shopId: string;
  versionId: string;
  status: string;
  currentCheckId: string;
  ambientC: number;
  meterRanges: MeterRange[];
}

export interface NewStep {
  shopId: string;
  diagnosisId: string;
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
  byId: string;
  recordedAt: Date;
  idempotencyKey: string | null;
}

const DOCUMENT_CACHE_LIMIT = 500;

export class StepStore {
  private readonly diagnosisQuery: Database.Statement;
  private readonly documentQuery: Database.Statement;
  private readonly pathQuery: Database.Statement;
  private readonly insertStep: Database.Statement;
  private readonly moveOn: Database.Statement;
  private readonly documents = new Map<string, ProcedureDocument>();

  constructor(db: Database.Database) {
    this.diagnosisQuery = db.prepare(
      `SELECT d.id, d.shopId, d.versionId, d.status, d.currentCheckId, d.ambientC, m.ranges AS meterRanges
       FROM diagnosis d JOIN meter m ON m.id = d.meterId WHERE d.id = ? AND d.shopId = ?`,
    );
    this.documentQuery = db.prepare(`SELECT document FROM procedure_version WHERE id = ? AND status != 'draft'`);
    this.pathQuery = db.prepare(`SELECT seq, checkId, valueSi, overRange, retracted, evaluation FROM diagnosis_step WHERE diagnosisId = ? ORDER BY seq`);
    this.insertStep = db.prepare(
      `INSERT INTO diagnosis_step (id, shopId, diagnosisId, seq, checkId, readingText, valueSi, overRange, verdict, choiceId, evaluation, nextCheckId, note, byId, recordedAt, retracted, retractedAt, idempotencyKey)
       VALUES (@id, @shopId, @diagnosisId, @seq, @checkId, @readingText, @valueSi, @overRange, @verdict, @choiceId, @evaluation, @nextCheckId, @note, @byId, @recordedAt, 0, NULL, @idempotencyKey)`,
    );
    this.moveOn = db.prepare(`UPDATE diagnosis SET currentCheckId = ? WHERE id = ?`);
  }

  diagnosis(id: string, shopId: string): OpenDiagnosis | undefined {
    const row = this.diagnosisQuery.get(id, shopId) as (Omit<OpenDiagnosis, 'meterRanges'> & { meterRanges: string }) | undefined;
    return row && { ...row, meterRanges: JSON.parse(row.meterRanges) };
  }

  document(versionId: string): ProcedureDocument {
    let doc = this.documents.get(versionId);
    if (!doc) {
      const row = this.documentQuery.get(versionId) as { document: string };
      doc = JSON.parse(row.document) as ProcedureDocument;
      if (this.documents.size >= DOCUMENT_CACHE_LIMIT) this.documents.delete(this.documents.keys().next().value!);
      this.documents.set(versionId, doc);
    }
    return doc;
  }

  /** Every step, retracted ones included, so the next sequence number is right; `path` keeps the live ones. */
  steps(diagnosisId: string): { lastSeq: number; path: PathSoFar } {
    const rows = this.pathQuery.all(diagnosisId) as { seq: number; checkId: string; valueSi: number | null; overRange: number; retracted: number; evaluation: string | null }[];
    const path = pathSoFar(
      rows.map((r) => ({
        checkId: r.checkId,
        valueSi: r.valueSi,
        overRange: r.overRange === 1,
        retracted: r.retracted === 1,
        evaluation: r.retracted || r.evaluation === null ? null : (JSON.parse(r.evaluation) as Evaluation),
      })),
    );
    return { lastSeq: rows.length ? rows[rows.length - 1].seq : 0, path };
  }

  record(step: NewStep): string {
    const id = crypto.randomUUID();
    this.insertStep.run({
      ...step,
      id,
      overRange: sqlBool(step.overRange),
      evaluation: step.evaluation === null ? null : JSON.stringify(step.evaluation),
      recordedAt: sqlDate(step.recordedAt),
    });
    this.moveOn.run(step.nextCheckId, step.diagnosisId);
    return id;
  }
}

const stores = new WeakMap<DataSource, StepStore>();

export function stepStoreOf(ds: DataSource): StepStore {
  let s = stores.get(ds);
  if (!s) {
    s = new StepStore(sqliteOf(ds));
    stores.set(ds, s);
  }
  return s;
}
