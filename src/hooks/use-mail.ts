import useSWR from 'swr';
import type { MailMessage, MailSummary } from '@shared/api/types';
import type { ApiError } from '@/lib/api';

/** The shop's captured outgoing mail, newest first. */
export function useMailList() {
  return useSWR<{ messages: MailSummary[] }, ApiError>('/api/mail');
}

export function useMailMessage(id: string | undefined) {
  return useSWR<{ message: MailMessage }, ApiError>(id ? `/api/mail/${id}` : null);
}
