import type { InviteInput, Role } from '@shared/schemas/auth';
import { request } from './http';

export interface Organization {
  id: string;
  name: string;
  kind: 'fabricator' | 'customer';
}

export interface Invitation {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
}

export async function fetchOrganizations(): Promise<Organization[]> {
  const reply = await request<{ items: Organization[] }>('/admin/organizations');
  return reply.items;
}

export async function createInvitation(input: InviteInput): Promise<Invitation> {
  const reply = await request<{ invitation: Invitation }>('/admin/invitations', { method: 'POST', body: input });
  return reply.invitation;
}
