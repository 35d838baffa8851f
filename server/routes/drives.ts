import { and, eq } from 'drizzle-orm';
import { Router } from 'express';
import type { Db } from '@/db/client';
import { gapHoursBetween } from '@/db/queries/drive-plans';
import { driveRecord } from '@/db/queries/mappers';
import { listStopRows } from '@/db/queries/stops';
import { logActivity, touchTrip } from '@/db/queries/trips';
import { drives } from '@/db/schema/drives';
import { planDrive } from '@/shared/geo/drive-estimate';
import { updateDriveRequestSchema } from '@/shared/schemas/api';
import { conflict, notFound, unprocessable } from '../errors';
import { idParam, requirePermission, tripAccess } from '../middleware/trip-access';

export function drivesRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router({ mergeParams: true });
  router.use(requirePermission('editTrip'));

  router.patch('/:driveId', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const driveId = idParam.parse(req.params.driveId);
    const { version, drive } = updateDriveRequestSchema.parse(req.body);
    const record = db.transaction((tx) => {
      const current = tx
        .select()
        .from(drives)
        .where(and(eq(drives.tripId, tripId), eq(drives.id, driveId)))
        .get();
      if (!current) throw notFound('That drive was not found.');
      if (current.version !== version) throw conflict(driveRecord(current));
      const stopRows = listStopRows(tx, tripId);
      const from = stopRows[current.position];
      const to = stopRows[current.position + 1];
      const gapH = from && to ? gapHoursBetween(from, to) : 0;
      // A client that sends only hours (or only a distance) has typed it: it stays as typed from then on.
      const hoursSource =
        drive.hoursSource ?? (drive.hoursOnRoad !== current.hoursOnRoad ? 'typed' : current.hoursSource);
      const distanceSource =
        drive.distanceSource ??
        (drive.distanceKm !== undefined && drive.distanceKm !== current.distanceKm ? 'typed' : current.distanceSource);
      const merged = {
        hoursOnRoad: drive.hoursOnRoad,
        vehicleCharging: drive.vehicleCharging,
        distanceKm: drive.distanceKm === undefined ? current.distanceKm : drive.distanceKm,
        distanceSource,
        roadFactor: drive.roadFactor ?? current.roadFactor,
        averageSpeedKmh: drive.averageSpeedKmh ?? current.averageSpeedKmh,
        hoursSource,
      };
      if (hoursSource === 'typed' && drive.hoursOnRoad > gapH + 1e-9) {
        throw unprocessable(
          'drive.hoursOnRoad',
          `The drive cannot last longer than the ${gapH.toFixed(1)} h between leaving ${from?.name ?? 'the stop'} and reaching ${to?.name ?? 'the next'}.`,
        );
      }
      const planned = from && to ? planDrive(merged, from, to, gapH) : merged;
      const row = tx
        .update(drives)
        .set({ ...planned, version: version + 1 })
        .where(eq(drives.id, driveId))
        .returning()
        .get();
      touchTrip(tx, tripId, now(), { routeChanged: true });
      logActivity(tx, { tripId, userId, summary: `changed the drive to ${to?.name ?? 'the next stop'}`, at: now() });
      return driveRecord(row);
    });
    res.json(record);
  });

  return router;
}
