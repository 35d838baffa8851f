import { and, asc, eq, isNull } from 'drizzle-orm';
import type { ApplianceFields } from '@/shared/schemas/appliance';
import type { Rig } from '@/shared/schemas/rig';
import type { DbExecutor } from '../client';
import { rigs, type RigRow } from '../schema/rigs';
import { rigToColumns } from './mappers';
import type { VersionedWrite } from './stops';

/** "My rigs": the user's saved rigs, not the copies trips run on. */
export function listSavedRigs(db: DbExecutor, ownerId: string): RigRow[] {
  return db
    .select()
    .from(rigs)
    .where(and(eq(rigs.ownerId, ownerId), isNull(rigs.tripId)))
    .orderBy(asc(rigs.name))
    .all();
}

export function findSavedRig(db: DbExecutor, ownerId: string, rigId: string): RigRow | undefined {
  return db
    .select()
    .from(rigs)
    .where(and(eq(rigs.id, rigId), eq(rigs.ownerId, ownerId), isNull(rigs.tripId)))
    .get();
}

/** One versioned change of a rig row: refused when the row is gone or the version is stale. */
function updateRigVersioned(
  db: DbExecutor,
  current: RigRow | undefined,
  version: number,
  columns: Partial<typeof rigs.$inferInsert>,
  now: Date,
): VersionedWrite<RigRow> {
  if (!current) return { status: 'missing' };
  if (current.version !== version) return { status: 'conflict', current };
  const row = db
    .update(rigs)
    .set({ ...columns, version: version + 1, updatedAt: now })
    .where(and(eq(rigs.id, current.id), eq(rigs.version, version)))
    .returning()
    .get();
  return { status: 'ok', row };
}

export function updateRigRow(
  db: DbExecutor,
  current: RigRow | undefined,
  version: number,
  rig: Rig,
  now: Date,
): VersionedWrite<RigRow> {
  return updateRigVersioned(db, current, version, rigToColumns(rig), now);
}

/** Replaces a saved rig's usual loads as one versioned change of the rig. */
export function updateRigLoads(
  db: DbExecutor,
  current: RigRow | undefined,
  version: number,
  loads: ApplianceFields[],
  now: Date,
): VersionedWrite<RigRow> {
  return updateRigVersioned(db, current, version, { loads }, now);
}

export function deleteSavedRig(db: DbExecutor, ownerId: string, rigId: string): boolean {
  return (
    db
      .delete(rigs)
      .where(and(eq(rigs.id, rigId), eq(rigs.ownerId, ownerId), isNull(rigs.tripId)))
      .run().changes > 0
  );
}
