import { describe, expect, it } from 'vitest';
import { parseProcedureDocument, procedureDocumentSchema } from '@shared/engine/procedure-schema';
import { generateProcedure } from '../../support/generate-procedure';
import { demoProcedure } from './demo-procedure';

/** The document as it arrives over the wire or out of the database. */
const asJson = (value: unknown): Record<string, any> => JSON.parse(JSON.stringify(value));

function errorsOf(doc: unknown): string[] {
  const r = parseProcedureDocument(doc);
  return r.ok ? [] : r.errors;
}

describe('procedureDocumentSchema', () => {
  it('accepts the demo procedure and generated ones, unchanged', () => {
    const demo = asJson(demoProcedure());
    const r = parseProcedureDocument(demo);
    expect(r.ok).toBe(true);
    expect(r.ok && r.document).toEqual(demo);
    for (const seed of [1, 2, 3]) expect(errorsOf(asJson(generateProcedure({ checks: 150, seed })))).toEqual([]);
  });

  it('refuses anything that is not a document', () => {
    for (const input of [null, 42, 'text', [], {}]) expect(parseProcedureDocument(input).ok).toBe(false);
  });

  it('refuses an unknown check kind or spec kind, saying which kinds exist', () => {
    const doc = asJson(demoProcedure());
    doc.checks[0].kind = 'guess';
    expect(errorsOf(doc).join(' ')).toMatch(/A check is one of: measure, observe, task, finding/);
    const doc2 = asJson(demoProcedure());
    doc2.checks[1].spec = { kind: 'about', value: 12 };
    expect(errorsOf(doc2).join(' ')).toMatch(/A spec is one of: window, nominal/);
  });

  it('refuses numbers sent as strings and non-finite numbers', () => {
    const doc = asJson(demoProcedure());
    doc.checks[1].spec.min = '12.4';
    expect(errorsOf(doc).join(' ')).toMatch(/Minimum is a number/);
    const doc2 = demoProcedure();
    (doc2.checks[2] as { range?: number }).range = Number.POSITIVE_INFINITY;
    expect(errorsOf(doc2).join(' ')).toMatch(/Range must be a finite number/);
  });

  it('refuses fields a check or spec does not use', () => {
    const doc = asJson(demoProcedure());
    doc.checks[1].colour = 'red';
    doc.checks[2].spec.nominal = 450;
    const errors = errorsOf(doc).join(' ');
    expect(errors).toMatch(/field it does not use: colour/);
    expect(errors).toMatch(/field it does not use: nominal/);
  });

  it('refuses an outcome keyed by something that is not a verdict', () => {
    const doc = asJson(demoProcedure());
    doc.checks[1].outcomes.fine = 'f-ecu';
    expect(errorsOf(doc).join(' ')).toMatch(/fine is not a verdict/);
  });

  it('refuses a measure check without quantity, spec or outcomes, reporting all at once', () => {
    const doc = asJson(demoProcedure());
    delete doc.checks[1].quantity;
    delete doc.checks[1].spec;
    delete doc.checks[1].outcomes;
    expect(errorsOf(doc)).toEqual(expect.arrayContaining(['Pick what the check measures.', 'Enter the spec.', 'Say where each verdict leads.']));
  });

  it('refuses blank titles, bad ids, a blank finding and pictures without a description', () => {
    const doc = asJson(demoProcedure());
    doc.checks[0].title = '   ';
    doc.checks[1].id = 'has space';
    doc.checks[7].finding.part = '';
    doc.checks[2].pictures = [{ src: 'diagrams/ckp.png', alt: '' }];
    const errors = errorsOf(doc).join(' ');
    expect(errors).toMatch(/Title can't be empty/);
    expect(errors).toMatch(/A check id is 1–64 letters/);
    expect(errors).toMatch(/Faulty part can't be empty/);
    expect(errors).toMatch(/Picture description can't be empty/);
  });

  it('refuses a re-test limit below 1 and a wire size system it does not know', () => {
    const doc = asJson(demoProcedure());
    doc.checks[2].retest.maxVisits = 0;
    doc.checks[4].spec.wire.gauge.system = 'swg';
    const errors = errorsOf(doc).join(' ');
    expect(errors).toMatch(/Allow at least 1 visit/);
    expect(errors).toMatch(/Wire size is AWG or mm²/);
  });

  it('is a plain yup schema the API’s validate middleware can run', async () => {
    await expect(procedureDocumentSchema.isValid(asJson(demoProcedure()), { abortEarly: false, stripUnknown: true })).resolves.toBe(true);
  });
});
