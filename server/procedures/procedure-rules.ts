import type { ProcedureDocument } from '@shared/engine/procedure';
import { parseProcedureDocument } from '@shared/engine/procedure-schema';
import { validateProcedure, type ValidationProblem } from '@shared/engine/validate-procedure';
import { ApiError } from '../http/api-error';

/** A new procedure's first draft: one finding, for the author to build the checks in front of. */
export function starterDocument(): ProcedureDocument {
  return {
    startCheckId: 'finding-1',
    cautions: ['The service manual for the machine, local codes and licensed practice come first.'],
    checks: [
      {
        id: 'finding-1',
        kind: 'finding',
        title: 'Describe the finding',
        instruction: 'Replace this with the checks that lead here.',
        finding: { part: 'To be named', action: 'To be named' },
      },
    ],
  };
}

/** Graph problems that block publishing; a draft may be saved with them. */
export const problemsOf = (document: ProcedureDocument): ValidationProblem[] => validateProcedure(document);

/** The shape of a procedure document, checked before anything is stored. */
export function readDocument(input: unknown): ProcedureDocument {
  const parsed = parseProcedureDocument(input);
  if (!parsed.ok) {
    const shown = parsed.errors.slice(0, 10);
    throw new ApiError(400, 'invalid_document', `The procedure document is not well formed: ${shown.join(' ')}`, undefined, { errors: parsed.errors.slice(0, 100) });
  }
  return parsed.document;
}
