import { describe, expect, it } from 'vitest';
import { procedureFile, readProcedureFile } from '@shared/procedures/exchange-format';
import { fixtureProcedure } from '../../support/fixture-procedure';

const meta = { title: 'No spark, pulse-coil twin', complaint: 'Cranks but no spark', family: 'Test twins' };

describe('procedure files', () => {
  it('reads back what it writes', () => {
    const file = JSON.parse(JSON.stringify(procedureFile(meta, '1', fixtureProcedure())));
    expect(readProcedureFile(file)).toEqual({ ok: true, ...meta, document: fixtureProcedure() });
  });

  it('refuses another format version, saying which it reads', () => {
    const result = readProcedureFile({ ...procedureFile(meta, '1', fixtureProcedure()), formatVersion: 2 });
    expect(result.ok).toBe(false);
    expect(!result.ok && result.errors[0]).toMatch(/format version 2; this Probepath reads version 1/);
  });

  it('names the check whose outcome leads nowhere', () => {
    const doc = fixtureProcedure();
    const spark = doc.checks[1];
    if (spark.kind === 'observe') spark.choices[0].next = 'ghost';
    const result = readProcedureFile(procedureFile(meta, '1', doc));
    expect(!result.ok && result.errors.join(' ')).toMatch(/Check “spark”.*“ghost”/);
  });

  it('refuses something that is not a procedure file at all', () => {
    expect(readProcedureFile([1, 2]).ok).toBe(false);
    expect(readProcedureFile({ format: 'other' }).ok).toBe(false);
  });
});
