import useSWR from 'swr';
import type { MeterView } from '@shared/api/workshop-types';
import type { ApiError } from '@/lib/api';

/** The shop's meters with their accuracy tables. */
export function useMeters() {
  return useSWR<{ meters: MeterView[] }, ApiError>('/api/meters');
}
