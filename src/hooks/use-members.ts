import useSWR from 'swr';
import useSWRMutation from 'swr/mutation';
import type { Member } from '@shared/api/types';
import type { UpdateMemberInput } from '@shared/auth/schemas';
import { api, type ApiError } from '@/lib/api';

const KEY = '/api/members';

export function useMembers() {
  return useSWR<{ members: Member[] }, ApiError>(KEY);
}

/** Change a member's role or active flag; the list refreshes afterwards. */
export function useUpdateMember() {
  return useSWRMutation<{ member: Member }, ApiError, string, { id: string; changes: UpdateMemberInput }>(
    KEY,
    (path, { arg }) => api(`${path}/${arg.id}`, 'PATCH', arg.changes),
  );
}
