import { ROLE_RANK, type Role } from '@/shared/schemas/roles';
import { inviteRoleSchema, type InviteRole } from '@/shared/schemas/sharing';

/** Nobody grants a role at or above their own; so the owner may add planners and a planner only crew or viewers. */
export function grantableRoles(myRole: Role): InviteRole[] {
  return inviteRoleSchema.options.filter((role) => ROLE_RANK[role] < ROLE_RANK[myRole]);
}
