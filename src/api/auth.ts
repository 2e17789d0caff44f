import type { ChangePasswordBody, LoginBody, LoginResponse, MeResponse, PasswordResetCompleteBody, SessionUser } from '@shared/schemas/auth';
import type { AcceptInvitationBody, InspectInvitationResponse } from '@shared/schemas/invitations';
import { api, setCsrfToken } from './client';

export async function signIn(body: LoginBody): Promise<LoginResponse> {
  const result = await api.post<LoginResponse>('/auth/login', body);
  setCsrfToken(result.csrfToken);
  return result;
}

export async function signOut(): Promise<void> {
  await api.post<void>('/auth/logout');
  setCsrfToken(null);
}

export const fetchMe = () => api.get<MeResponse>('/auth/me');
export const changePassword = (body: ChangePasswordBody) => api.post<void>('/auth/password', body);
export const requestPasswordReset = (email: string) => api.post<{ message: string }>('/auth/password-reset', { email });
export const completePasswordReset = (body: PasswordResetCompleteBody) => api.post<void>('/auth/password-reset/complete', body);
export const inspectInvitation = (token: string) => api.post<InspectInvitationResponse>('/invitations/inspect', { token });
export const acceptInvitation = (body: AcceptInvitationBody) => api.post<SessionUser>('/invitations/accept', body);
