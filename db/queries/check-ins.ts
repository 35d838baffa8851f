import { and, asc, count, eq } from 'drizzle-orm';
import type { CheckInFields, CheckInRecord } from '@/shared/schemas/check-in';
import type { DbExecutor } from '../client';
import { user } from '../schema/auth';
import { checkIns } from '../schema/check-ins';
import type { VersionedWrite } from './stops';

type Reading = Omit<CheckInFields, 'at'> & { at: string };

const columns = {
  id: checkIns.id,
  version: checkIns.version,
  authorId: checkIns.authorId,
  authorName: user.name,
  createdAt: checkIns.createdAt,
  at: checkIns.at,
  socPct: checkIns.socPct,
  propane: checkIns.propane,
  harvestWh: checkIns.harvestWh,
  note: checkIns.note,
};

type Selected = {
  id: string;
  version: number;
  authorId: string | null;
  authorName: string | null;
  createdAt: Date;
  at: string;
  socPct: number;
  propane: CheckInFields['propane'];
  harvestWh: number | null;
  note: string;
};

function toRecord(row: Selected): CheckInRecord {
  return {
    id: row.id,
    version: row.version,
    authorId: row.authorId,
    authorName: row.authorName ?? 'A former member',
    createdAt: row.createdAt.toISOString(),
    checkIn: { at: row.at, socPct: row.socPct, propane: row.propane, harvestWh: row.harvestWh, note: row.note },
  };
}

function selectCheckIns(db: DbExecutor) {
  return db.select(columns).from(checkIns).leftJoin(user, eq(user.id, checkIns.authorId));
}

/** Oldest reading first: the latest is the last. */
export function listCheckIns(db: DbExecutor, tripId: string): CheckInRecord[] {
  return selectCheckIns(db)
    .where(eq(checkIns.tripId, tripId))
    .orderBy(asc(checkIns.atMs), asc(checkIns.createdAt))
    .all()
    .map(toRecord);
}

export function findCheckIn(db: DbExecutor, tripId: string, checkInId: string): CheckInRecord | undefined {
  const row = selectCheckIns(db)
    .where(and(eq(checkIns.tripId, tripId), eq(checkIns.id, checkInId)))
    .get();
  return row ? toRecord(row) : undefined;
}

export function countCheckIns(db: DbExecutor, tripId: string): number {
  return db.select({ n: count() }).from(checkIns).where(eq(checkIns.tripId, tripId)).get()?.n ?? 0;
}

function readingColumns(reading: Reading) {
  return {
    at: reading.at,
    atMs: Date.parse(reading.at),
    socPct: reading.socPct,
    propane: reading.propane,
    harvestWh: reading.harvestWh,
    note: reading.note,
  };
}

export function insertCheckIn(
  db: DbExecutor,
  tripId: string,
  authorId: string,
  reading: Reading,
  now: Date,
): CheckInRecord {
  const id = crypto.randomUUID();
  db.insert(checkIns)
    .values({ id, tripId, authorId, ...readingColumns(reading), createdAt: now, version: 1 })
    .run();
  return findCheckIn(db, tripId, id) as CheckInRecord;
}

export function updateCheckIn(
  db: DbExecutor,
  tripId: string,
  checkInId: string,
  version: number,
  reading: Reading,
): VersionedWrite<CheckInRecord> {
  const current = findCheckIn(db, tripId, checkInId);
  if (!current) return { status: 'missing' };
  if (current.version !== version) return { status: 'conflict', current };
  db.update(checkIns)
    .set({ ...readingColumns(reading), version: version + 1 })
    .where(and(eq(checkIns.id, checkInId), eq(checkIns.version, version)))
    .run();
  return { status: 'ok', row: findCheckIn(db, tripId, checkInId) as CheckInRecord };
}

export function deleteCheckIn(db: DbExecutor, tripId: string, checkInId: string): boolean {
  return (
    db
      .delete(checkIns)
      .where(and(eq(checkIns.tripId, tripId), eq(checkIns.id, checkInId)))
      .run().changes > 0
  );
}
