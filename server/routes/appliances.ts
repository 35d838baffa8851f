import { Router } from 'express';
import type { Db, DbExecutor } from '@/db/client';
import {
  countAppliances,
  deleteAppliance,
  findAppliance,
  insertAppliance,
  updateAppliance,
} from '@/db/queries/appliances';
import { findMembership, findTrip, logActivity, touchTrip } from '@/db/queries/trips';
import type { Schedule } from '@/shared/schemas/appliance';
import { LIMITS } from '@/shared/schemas/limits';
import { checkScheduleInTrip } from '@/shared/trip-rules';
import {
  createApplianceRequestSchema,
  updateApplianceRequestSchema,
  updateScheduleRequestSchema,
} from '@/shared/schemas/api';
import { limitReached, notFound, unprocessable } from '../errors';
import { idParam, requirePermission, tripAccess } from '../middleware/trip-access';
import { unwrapWrite } from './write-result';

function assertCaretakerIsMember(db: DbExecutor, tripId: string, caretakerUserId: string | null | undefined): void {
  if (caretakerUserId != null && !findMembership(db, tripId, caretakerUserId)) {
    throw unprocessable('caretakerUserId', 'The person looking after an appliance must be a member of the trip.');
  }
}

/** Trip days a routine names must be days of this trip. */
export function assertScheduleInTrip(db: DbExecutor, tripId: string, schedule: Schedule, field: string): void {
  const trip = findTrip(db, tripId);
  if (!trip) throw notFound('That trip was not found.');
  const breach = checkScheduleInTrip(trip, schedule, field);
  if (breach) throw unprocessable(breach.field, breach.message);
}

export function appliancesRouter({ db, now }: { db: Db; now: () => Date }): Router {
  const router = Router({ mergeParams: true });
  router.use(requirePermission('editLoads'));

  router.post('/', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const { appliance, caretakerUserId } = createApplianceRequestSchema.parse(req.body);
    const record = db.transaction((tx) => {
      if (countAppliances(tx, tripId) >= LIMITS.appliancesPerTrip)
        throw limitReached(
          'appliances',
          `A trip holds at most ${LIMITS.appliancesPerTrip} appliances. Remove one, or combine similar ones with a quantity.`,
        );
      assertScheduleInTrip(tx, tripId, appliance.schedule, 'appliance.schedule');
      assertCaretakerIsMember(tx, tripId, caretakerUserId);
      const created = insertAppliance(tx, tripId, appliance, caretakerUserId);
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: `added the appliance ${appliance.name}`, at: now() });
      return created;
    });
    res.status(201).json(record);
  });

  router.patch('/:applianceId', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const applianceId = idParam.parse(req.params.applianceId);
    const { version, appliance, caretakerUserId } = updateApplianceRequestSchema.parse(req.body);
    const record = db.transaction((tx) => {
      assertScheduleInTrip(tx, tripId, appliance.schedule, 'appliance.schedule');
      assertCaretakerIsMember(tx, tripId, caretakerUserId);
      const result = updateAppliance(tx, tripId, applianceId, version, { fields: appliance, caretakerUserId });
      const updated = unwrapWrite(result, (row) => row, 'appliance');
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: `changed the appliance ${appliance.name}`, at: now() });
      return updated;
    });
    res.json(record);
  });

  router.put('/:applianceId/schedule', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const applianceId = idParam.parse(req.params.applianceId);
    const { version, schedule } = updateScheduleRequestSchema.parse(req.body);
    const record = db.transaction((tx) => {
      assertScheduleInTrip(tx, tripId, schedule, 'schedule');
      const updated = unwrapWrite(
        updateAppliance(tx, tripId, applianceId, version, { schedule }),
        (row) => row,
        'appliance',
      );
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: `changed when ${updated.appliance.name} runs`, at: now() });
      return updated;
    });
    res.json(record);
  });

  router.delete('/:applianceId', (req, res) => {
    const { tripId, userId } = tripAccess(res);
    const applianceId = idParam.parse(req.params.applianceId);
    db.transaction((tx) => {
      const current = findAppliance(tx, tripId, applianceId);
      if (!current || !deleteAppliance(tx, tripId, applianceId)) throw notFound('That appliance was not found.');
      touchTrip(tx, tripId, now());
      logActivity(tx, { tripId, userId, summary: `removed the appliance ${current.appliance.name}`, at: now() });
    });
    res.status(204).end();
  });

  return router;
}
