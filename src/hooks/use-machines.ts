import useSWR from 'swr';
import useSWRMutation from 'swr/mutation';
import type { MachineView } from '@shared/api/workshop-types';
import type { MachineInput } from '@shared/workshop/schemas';
import { api, type ApiError } from '@/lib/api';

const KEY = '/api/machines';

/** The shop's machines, newest first. */
export function useMachines() {
  return useSWR<{ machines: MachineView[] }, ApiError>(KEY);
}

export function useCreateMachine() {
  return useSWRMutation<{ machine: MachineView }, ApiError, string, { input: MachineInput; key: string }>(KEY, (path, { arg }) =>
    api(path, 'POST', arg.input, { idempotencyKey: arg.key }),
  );
}
