import type { ProcedureDocument } from '@shared/engine/procedure';
import type { ValidationProblem } from '@shared/engine/validate-procedure';

export function starterDocument(): ProcedureDocument {
  return { startCheckId: 'finding-1', cautions: [], checks: [{ id: 'finding-1', kind: 'finding', title: 'Finding', instruction: '', finding: { part: '', action: '' } }] };
}
export function problemsOf(_d: ProcedureDocument): ValidationProblem[] {
  return [];
}
export function readDocument(d: unknown): ProcedureDocument {
  return d as ProcedureDocument;
}
