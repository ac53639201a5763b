import useSWR from 'swr';
import useSWRMutation from 'swr/mutation';
import type { JobListItem, JobView } from '@shared/api/workshop-types';
import type { JobInput } from '@shared/workshop/schemas';
import { api, type ApiError } from '@/lib/api';

const KEY = '/api/jobs';

/** The shop's jobs with their machines, newest first, each saying when it was last diagnosed to a finding. */
export function useJobs() {
  return useSWR<{ jobs: JobListItem[] }, ApiError>(KEY);
}

export function useCreateJob() {
  return useSWRMutation<{ job: JobView }, ApiError, string, { input: JobInput; key: string }>(KEY, (path, { arg }) =>
    api(path, 'POST', arg.input, { idempotencyKey: arg.key }),
  );
}
