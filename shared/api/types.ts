import type { Role } from '../auth/roles';

/** JSON shapes of the API, shared by server responses and client hooks. */

export interface ApiErrorBody {
  error: { code: string; message: string; fields?: Record<string, string> };
}

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  role: Role;
  shopId: string;
  shopName: string;
}

export interface SignInResponse {
  token: string;
  expiresAt: string;
  user: SessionUser;
}

export interface Member {
  id: string;
  email: string;
  name: string;
  role: Role;
  active: boolean;
  createdAt: string;
}

export interface Invite {
  id: string;
  email: string;
  role: Role;
  invitedBy: string;
  expiresAt: string;
  createdAt: string;
}

export interface CreateInviteResponse {
  invite: Invite;
  /** False when the invite was saved but its e-mail could not be sent. */
  mailSent: boolean;
}

export interface InvitePreview {
  email: string;
  role: Role;
  shopName: string;
}

export interface MailSummary {
  id: string;
  to: string;
  subject: string;
  createdAt: string;
}

export interface MailMessage extends MailSummary {
  from: string;
  text: string;
  html: string | null;
  attachments: { filename: string; contentType: string; size: number }[];
}
