import { z } from "zod";
import { emailSchema } from "@shared/api/auth";

export const roles = ["owner", "editor", "viewer"] as const;
export const roleSchema = z.enum(roles);
export type Role = z.infer<typeof roleSchema>;

/** What each role may do; the server enforces it, the client only hides what would be refused. */
export const canEdit = (role: Role): boolean => role === "owner" || role === "editor";
export const canManageMembers = (role: Role): boolean => role === "owner";

export const createTeamSchema = z.object({
  name: z.string().trim().min(1, "Enter a team name").max(80, "Use at most 80 characters"),
});
export type CreateTeamInput = z.infer<typeof createTeamSchema>;

export const inviteSchema = z.object({ email: emailSchema, role: roleSchema });
export type InviteInput = z.infer<typeof inviteSchema>;

export const changeRoleSchema = z.object({ role: roleSchema });
export type ChangeRoleInput = z.infer<typeof changeRoleSchema>;

export interface TeamView {
  id: string;
  name: string;
  role: Role; // the caller's role in this team
  memberCount: number;
}

export interface MemberView {
  userId: string;
  name: string;
  email: string;
  role: Role;
  joinedAt: string;
}

export interface InvitationView {
  id: string;
  email: string;
  role: Role;
  expiresAt: string;
  invitedBy: string; // inviter's name
}

/** Public view of an invitation for the /invite/:token page. */
export interface InvitationPreview {
  teamName: string;
  email: string;
  role: Role;
  invitedBy: string;
  expiresAt: string;
  accountExists: boolean;
}
