import useSWR from 'swr';
import useSWRMutation from 'swr/mutation';
import type { CreateInviteResponse, Invite, InvitePreview, SignInResponse } from '@shared/api/types';
import type { AcceptInviteInput, CreateInviteInput } from '@shared/auth/schemas';
import { api, type ApiError } from '@/lib/api';

const KEY = '/api/invites';

/** Pending invites of the owner's shop. */
export function useInvites() {
  return useSWR<{ invites: Invite[] }, ApiError>(KEY);
}

export function useCreateInvite() {
  return useSWRMutation<CreateInviteResponse, ApiError, string, CreateInviteInput>(KEY, (path, { arg }) =>
    api(path, 'POST', arg),
  );
}

export function useRevokeInvite() {
  return useSWRMutation<void, ApiError, string, string>(KEY, (path, { arg: id }) => api(`${path}/${id}`, 'DELETE'));
}

/** What an invite link offers: the shop, the role and the address it was sent to. */
export function useInvitePreview(token: string | undefined) {
  return useSWR<InvitePreview, ApiError>(token ? `${KEY}/preview?token=${encodeURIComponent(token)}` : null, {
    shouldRetryOnError: false,
  });
}

export function useAcceptInvite() {
  return useSWRMutation<SignInResponse, ApiError, string, AcceptInviteInput>(`${KEY}/accept`, (path, { arg }) =>
    api(path, 'POST', arg),
  );
}
