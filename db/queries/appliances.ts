import { and, asc, count, eq, max } from 'drizzle-orm';
import type { ApplianceRecord } from '@/shared/schemas/api';
import type { ApplianceFields, Schedule } from '@/shared/schemas/appliance';
import type { DbExecutor } from '../client';
import { appliances, routineWindows } from '../schema/appliances';
import { applianceRecord, applianceToColumns, scheduleToColumns, scheduleWindows } from './mappers';
import type { VersionedWrite } from './stops';

export function findAppliance(db: DbExecutor, tripId: string, applianceId: string): ApplianceRecord | undefined {
  const row = db
    .select()
    .from(appliances)
    .where(and(eq(appliances.tripId, tripId), eq(appliances.id, applianceId)))
    .get();
  if (!row) return undefined;
  const windows = db
    .select()
    .from(routineWindows)
    .where(eq(routineWindows.applianceId, row.id))
    .orderBy(asc(routineWindows.position))
    .all();
  return applianceRecord(row, windows);
}

function writeWindows(db: DbExecutor, applianceId: string, schedule: Schedule): void {
  db.delete(routineWindows).where(eq(routineWindows.applianceId, applianceId)).run();
  scheduleWindows(schedule).forEach((window, position) =>
    db
      .insert(routineWindows)
      .values({ applianceId, position, ...window })
      .run(),
  );
}

export function countAppliances(db: DbExecutor, tripId: string): number {
  return db.select({ n: count() }).from(appliances).where(eq(appliances.tripId, tripId)).get()?.n ?? 0;
}

export function insertAppliance(
  db: DbExecutor,
  tripId: string,
  fields: ApplianceFields,
  caretakerUserId: string | null,
): ApplianceRecord {
  const id = crypto.randomUUID();
  const last = db
    .select({ position: max(appliances.position) })
    .from(appliances)
    .where(eq(appliances.tripId, tripId))
    .get();
  db.insert(appliances)
    .values({
      id,
      tripId,
      position: (last?.position ?? -1) + 1,
      ...applianceToColumns(fields),
      caretakerUserId,
      version: 1,
    })
    .run();
  writeWindows(db, id, fields.schedule);
  return findAppliance(db, tripId, id) as ApplianceRecord;
}

export function updateAppliance(
  db: DbExecutor,
  tripId: string,
  applianceId: string,
  version: number,
  change: { fields: ApplianceFields; caretakerUserId?: string | null } | { schedule: Schedule },
): VersionedWrite<ApplianceRecord> {
  const current = findAppliance(db, tripId, applianceId);
  if (!current) return { status: 'missing' };
  if (current.version !== version) return { status: 'conflict', current };
  const schedule = 'schedule' in change ? change.schedule : change.fields.schedule;
  const columns =
    'schedule' in change
      ? scheduleToColumns(change.schedule)
      : {
          ...applianceToColumns(change.fields),
          caretakerUserId: change.caretakerUserId === undefined ? current.caretakerUserId : change.caretakerUserId,
        };
  db.update(appliances)
    .set({ ...columns, version: version + 1 })
    .where(and(eq(appliances.id, applianceId), eq(appliances.version, version)))
    .run();
  writeWindows(db, applianceId, schedule);
  return { status: 'ok', row: findAppliance(db, tripId, applianceId) as ApplianceRecord };
}

export function deleteAppliance(db: DbExecutor, tripId: string, applianceId: string): boolean {
  return (
    db
      .delete(appliances)
      .where(and(eq(appliances.tripId, tripId), eq(appliances.id, applianceId)))
      .run().changes > 0
  );
}
