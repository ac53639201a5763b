import useSWR from 'swr';
import type { VersionInsight } from '@shared/api/replay-types';
import type { ApiError } from '@/lib/api';

/** What the concluded diagnoses of one procedure version say about it (leads and owners). */
export function useVersionInsight(procedureId: string | null, versionNumber: number | null) {
  return useSWR<{ insight: VersionInsight }, ApiError>(procedureId && versionNumber ? `/api/procedures/${procedureId}/versions/${versionNumber}/insight` : null);
}
