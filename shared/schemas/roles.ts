import { z } from 'zod';

export const roleSchema = z.enum(['owner', 'planner', 'crew', 'viewer']);
export type Role = z.infer<typeof roleSchema>;

/** Higher ranks hold every right of the lower ones. */
export const ROLE_RANK: Record<Role, number> = { viewer: 0, crew: 1, planner: 2, owner: 3 };

/**
 * What each role may do to a trip. One table, read by the API's role middleware and by the
 * screens (to show a tab as read-only), so the two can never disagree.
 */
export const PERMISSIONS = {
  read: 'viewer',
  editLoads: 'crew',
  editTrip: 'planner',
  manageMembers: 'owner',
  deleteTrip: 'owner',
} as const satisfies Record<string, Role>;
export type Permission = keyof typeof PERMISSIONS;

export function can(role: Role, permission: Permission): boolean {
  return ROLE_RANK[role] >= ROLE_RANK[PERMISSIONS[permission]];
}
