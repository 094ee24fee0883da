import { z } from 'zod';
import { EmailSchema } from './auth';

export const ROLES = ['owner', 'editor', 'viewer'] as const;
export const RoleSchema = z.enum(ROLES, { error: 'Choose owner, editor or viewer' });
export type Role = z.infer<typeof RoleSchema>;

/** Viewers read and download; editors also change robots; owners also manage people. */
const RANK: Record<Role, number> = { viewer: 1, editor: 2, owner: 3 };

export function roleAtLeast(role: Role, minimum: Role): boolean {
  return RANK[role] >= RANK[minimum];
}

export const ROLE_SUMMARIES: Record<Role, string> = {
  owner: 'Manages people and robots',
  editor: 'Changes robots and saves revisions',
  viewer: 'Reads and downloads',
};

export const TeamNameSchema = z
  .string({ error: 'Give the team a name' })
  .trim()
  .min(1, 'Give the team a name')
  .max(80, 'At most 80 characters');

export const CreateTeamInputSchema = z.object({ name: TeamNameSchema });
export type CreateTeamInput = z.input<typeof CreateTeamInputSchema>;

export const InviteMemberInputSchema = z.object({ email: EmailSchema, role: RoleSchema });
export type InviteMemberInput = z.input<typeof InviteMemberInputSchema>;

export const ChangeRoleInputSchema = z.object({ role: RoleSchema });
export type ChangeRoleInput = z.input<typeof ChangeRoleInputSchema>;

export interface TeamSummary {
  id: string;
  name: string;
  role: Role;
  memberCount: number;
  robotCount: number;
  createdAt: string;
}

export interface TeamDetail {
  id: string;
  name: string;
  role: Role;
  createdAt: string;
}

export interface TeamMember {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

export interface PendingInvitation {
  id: string;
  email: string;
  role: Role;
  invitedByName: string;
  createdAt: string;
  expiresAt: string;
}

/**
 * How invitation links reach people: by e-mail, or, when the server has no outgoing mail
 * server, handed to the owner to pass on themselves.
 */
export type InvitationDelivery = 'email' | 'by-hand';

export interface InvitationPreview {
  teamName: string;
  email: string;
  role: Role;
  invitedByName: string;
  expiresAt: string;
}
