import * as yup from 'yup';
import type { ProcedureDocument } from '../engine/procedure';
import { parseProcedureDocument } from '../engine/procedure-schema';
import { validateProcedure } from '../engine/validate-procedure';
import { createProcedureSchema } from './schemas';

/**
 * Probepath's procedure file (documented in DEVELOPERS.md, "Procedure files"): one procedure version with
 * its title, complaint and family, as JSON. `formatVersion` changes whenever a reader of the old version
 * could misread the new one.
 *
 * Check pictures travel by id only (`pictures[].src` is the id of a picture stored in the shop), not as
 * bytes: the importing server refuses a file showing a picture it doesn't store, naming each one, so a
 * file taken to another shop never arrives with broken pictures.
 */
export const PROCEDURE_FILE_FORMAT = 'probepath.procedure';
export const PROCEDURE_FILE_VERSION = 1;

export interface ProcedureFile {
  format: typeof PROCEDURE_FILE_FORMAT;
  formatVersion: typeof PROCEDURE_FILE_VERSION;
  title: string;
  complaint: string;
  family: string;
  /** Which version was exported ("draft" or its number), for the reader's information. */
  exportedFrom: string;
  exportedAt: string;
  document: ProcedureDocument;
}

export type ProcedureFileRead =
  | { ok: true; title: string; complaint: string; family: string; document: ProcedureDocument }
  | { ok: false; errors: string[] };

/**
 * Reads an untrusted procedure file, all or nothing: the envelope, then the document's shape, then the
 * engine's publishing rules (every outcome leads to an existing check, no unintended loops…). Each error
 * names what is wrong and where.
 */
export function readProcedureFile(input: unknown): ProcedureFileRead {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    return { ok: false, errors: ['This is not a procedure file: expected a JSON object.'] };
  }
  const file = input as Record<string, unknown>;
  if (file.format !== PROCEDURE_FILE_FORMAT) {
    return { ok: false, errors: [`This is not a Probepath procedure file: "format" must be "${PROCEDURE_FILE_FORMAT}".`] };
  }
  if (file.formatVersion !== PROCEDURE_FILE_VERSION) {
    return {
      ok: false,
      errors: [`This file is format version ${JSON.stringify(file.formatVersion ?? null)}; this Probepath reads version ${PROCEDURE_FILE_VERSION}. Export it again from a matching Probepath.`],
    };
  }
  let envelope: { title: string; complaint: string; family: string };
  try {
    envelope = createProcedureSchema.validateSync({ title: file.title, complaint: file.complaint, family: file.family }, { abortEarly: false });
  } catch (error) {
    if (error instanceof yup.ValidationError) return { ok: false, errors: error.errors };
    throw error;
  }
  const parsed = parseProcedureDocument(file.document);
  if (!parsed.ok) return { ok: false, errors: parsed.errors.map((e) => `Document: ${e}`) };
  const problems = validateProcedure(parsed.document);
  if (problems.length) return { ok: false, errors: problems.map((p) => `Check “${p.checkId}”: ${p.message}`) };
  return { ok: true, ...envelope, document: parsed.document };
}

export function procedureFile(meta: { title: string; complaint: string; family: string }, exportedFrom: string, document: ProcedureDocument, now = new Date()): ProcedureFile {
  return {
    format: PROCEDURE_FILE_FORMAT,
    formatVersion: PROCEDURE_FILE_VERSION,
    title: meta.title,
    complaint: meta.complaint,
    family: meta.family,
    exportedFrom,
    exportedAt: now.toISOString(),
    document,
  };
}

/** "Coil and pickup check", version 2 → "coil-and-pickup-check-v2.probepath.json"; the draft ends "-draft". */
export function procedureFileName(title: string, exportedFrom: string): string {
  const name = title.toLowerCase().replace(/[^a-z0-9]+/g, '-').replace(/^-|-$/g, '').slice(0, 60) || 'procedure';
  return `${name}-${exportedFrom === 'draft' ? 'draft' : `v${exportedFrom}`}.probepath.json`;
}
