import type { Role } from '@/shared/schemas/roles';

export const ROLE_LABEL: Record<Role, string> = { owner: 'Owner', planner: 'Planner', crew: 'Crew', viewer: 'Viewer' };
