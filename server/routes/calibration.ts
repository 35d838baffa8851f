// POST /api/trips/:tripId/calibration — use what we saw: the fitted sky openness of one stop and the fitted scale on
// every appliance's draws, saved together in one transaction from the versions the fit was made on, or not at all.
import { Router } from 'express';
import type { Db } from '@/db/client';
import { writeCalibration } from '@/db/queries/calibration';
import { loadTripDetail, logActivity, touchTrip } from '@/db/queries/trips';
import { calibratedExposure, scaledDraws } from '@/shared/engine/calibrate';
import { applyCalibrationRequestSchema } from '@/shared/schemas/api';
import { runningWSchema, standbyWSchema } from '@/shared/schemas/appliance';
import { conflict, notFound, unprocessable } from '../errors';
import { requirePermission, tripAccess } from '../middleware/trip-access';

export function calibrationRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router({ mergeParams: true });

  // A stop's exposure is the trip's plan, so planners and the owner accept a calibration (crew edit loads only).
  router.post('/calibration', requirePermission('editTrip'), (req, res) => {
    const { tripId, userId, role } = tripAccess(res);
    const body = applyCalibrationRequestSchema.parse(req.body);
    db.transaction((tx) => {
      const detail = loadTripDetail(tx, tripId, role);
      if (!detail) throw notFound('That trip was not found.');
      const stop = detail.stops.find((s) => s.id === body.stopId);
      if (!stop) throw notFound('That stop was not found.');
      const fittedOn = new Map(body.appliances.map((a) => [a.id, a.version]));
      const stale =
        stop.version !== body.stopVersion ||
        fittedOn.size !== detail.appliances.length ||
        detail.appliances.some((a) => fittedOn.get(a.id) !== a.version);
      if (stale) throw conflict(detail);
      const appliances = detail.appliances.map((record) => {
        const draws = scaledDraws(record.appliance, body.loadScale);
        if (!runningWSchema.safeParse(draws.runningW).success || !standbyWSchema.safeParse(draws.standbyW).success)
          throw unprocessable(
            'loadScale',
            `At that scale ${record.appliance.name} would draw more than an appliance can: check its watts first.`,
          );
        return { id: record.id, version: record.version, ...draws };
      });
      const exposure = calibratedExposure(stop.stop.exposure, body.skyOpennessPct);
      if (writeCalibration(tx, tripId, { stop: { id: stop.id, version: stop.version, exposure }, appliances }) !== 'ok')
        throw conflict(detail);
      touchTrip(tx, tripId, now());
      const scale = `×${body.loadScale.toFixed(2)}`;
      logActivity(tx, {
        tripId,
        userId,
        summary: `calibrated ${stop.stop.name} from check-ins (sky ${Math.round(body.skyOpennessPct)} % open, loads ${scale})`,
        at: now(),
      });
    });
    res.json(loadTripDetail(db, tripId, role));
  });

  return router;
}
