import { and, asc, eq } from 'drizzle-orm';
import type { Member } from '@/shared/schemas/api';
import type { Role } from '@/shared/schemas/roles';
import type { DbExecutor } from '../client';
import { user } from '../schema/auth';
import { memberships } from '../schema/memberships';

/** Members with their addresses; what a reader through a club may see is decided by the route. */
export function listMembers(db: DbExecutor, tripId: string): (Member & { email: string })[] {
  return db
    .select({ userId: user.id, name: user.name, email: user.email, role: memberships.role })
    .from(memberships)
    .innerJoin(user, eq(user.id, memberships.userId))
    .where(eq(memberships.tripId, tripId))
    .orderBy(asc(user.name))
    .all();
}

export function addMember(db: DbExecutor, tripId: string, userId: string, role: Role, now: Date): void {
  db.insert(memberships)
    .values({ tripId, userId, role, createdAt: now })
    .onConflictDoUpdate({ target: [memberships.tripId, memberships.userId], set: { role } })
    .run();
}

export function setMemberRole(db: DbExecutor, tripId: string, userId: string, role: Role): boolean {
  return (
    db
      .update(memberships)
      .set({ role })
      .where(and(eq(memberships.tripId, tripId), eq(memberships.userId, userId)))
      .run().changes > 0
  );
}

export function removeMember(db: DbExecutor, tripId: string, userId: string): boolean {
  return (
    db
      .delete(memberships)
      .where(and(eq(memberships.tripId, tripId), eq(memberships.userId, userId)))
      .run().changes > 0
  );
}
