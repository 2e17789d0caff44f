import type { Page } from '@shared/schemas/common';
import type { CreateInvitationBody, Invitation, InvitationStatus } from '@shared/schemas/invitations';
import type { Role } from '@shared/roles';
import type { UpdateUserBody, User, UserStatus } from '@shared/schemas/users';
import { api } from './client';

export interface UserListParams {
  page: number;
  pageSize: number;
  sort: string;
  role?: Role;
  status?: UserStatus;
  q?: string;
}

export const listUsers = (params: UserListParams) => api.get<Page<User>>('/users', { ...params });
export const getUser = (id: number) => api.get<User>(`/users/${id}`);
export const updateUser = (id: number, body: UpdateUserBody) => api.patch<User>(`/users/${id}`, body);
export const deactivateUser = (id: number, reason?: string) => api.post<User>(`/users/${id}/deactivate`, reason ? { reason } : {});
export const reactivateUser = (id: number) => api.post<User>(`/users/${id}/reactivate`);

export interface InvitationListParams {
  page: number;
  pageSize: number;
  sort: string;
  status?: InvitationStatus;
}

export const listInvitations = (params: InvitationListParams) => api.get<Page<Invitation>>('/invitations', { ...params });
export const createInvitation = (body: CreateInvitationBody) => api.post<Invitation>('/invitations', body);
export const resendInvitation = (id: number) => api.post<Invitation>(`/invitations/${id}/resend`);
export const revokeInvitation = (id: number) => api.post<Invitation>(`/invitations/${id}/revoke`);
