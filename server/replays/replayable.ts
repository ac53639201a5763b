import type { EntityManager } from 'typeorm';
import { DiagnosisStep } from '../diagnoses/diagnosis-step.entity';
import { Diagnosis } from '../diagnoses/diagnosis.entity';
import { ApiError, notFound } from '../http/api-error';
import type { ProcedureVersion } from '../procedures/procedure-version.entity';
import type { User } from '../users/user.entity';

export type ReplayableDiagnosis = Diagnosis & { version: ProcedureVersion };

/**
 * A diagnosis of the member's shop that the member may read, with its pinned version. Apprentices see
 * concluded diagnoses only, as on GET /api/diagnoses/:id: anything else is "not found" to them.
 */
export async function readableDiagnosis(m: EntityManager, member: User, id: string): Promise<ReplayableDiagnosis> {
  const d = await m.getRepository(Diagnosis).findOne({ where: { id, shopId: member.shopId }, relations: { version: true } });
  if (!d || (member.role === 'apprentice' && d.status !== 'concluded')) throw notFound('diagnosis');
  return d as ReplayableDiagnosis;
}

/** Replays, comments and practice are about concluded diagnoses only. */
export function requireConcluded(d: Diagnosis, what: string) {
  if (d.status !== 'concluded') throw new ApiError(409, 'not_concluded', `${what} are for concluded diagnoses; this one is ${d.status}.`);
}

export async function stepOf(m: EntityManager, diagnosisId: string, seq: unknown): Promise<DiagnosisStep> {
  const n = typeof seq === 'number' ? seq : /^\d{1,6}$/.test(String(seq)) ? Number(seq) : NaN;
  const step = Number.isInteger(n) ? await m.getRepository(DiagnosisStep).findOneBy({ diagnosisId, seq: n }) : null;
  if (!step) throw new ApiError(404, 'not_found', `This diagnosis has no step ${String(seq)}.`);
  return step;
}
