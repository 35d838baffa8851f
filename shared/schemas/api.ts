// The JSON contract between the API and the screens. Records are the engine's input schemas plus
// the server-owned fields (id, version); requests reuse the same schemas so forms, API and engine agree.
import { z } from 'zod';
import { nameText } from './text';
import { applianceFieldsSchema, applianceSchema, runningWSchema, scheduleSchema, standbyWSchema } from './appliance';
import { rigSchema } from './rig';
import { roleSchema } from './roles';
import { driveSchema, siteExposureSchema, stopSchema } from './trip';
import { isoDateSchema, tripSummarySchema } from './trip-summary';
import { percentSchema, timeZoneSchema } from './common';
import { basedOnSchema } from './sharing';
import { fieldRule, LIMITS, tripDayCount } from './limits';

/** Every update names the version it was based on; a stale one gets 409 with the current record. */
export const versionSchema = z.number().int().min(1);
const idSchema = z.string().min(1).max(64);

// ---- records (responses) ----
export const rigRecordSchema = z.object({ id: idSchema, version: versionSchema, rig: rigSchema });
export type RigRecord = z.infer<typeof rigRecordSchema>;

/** A saved rig's usual loads: the appliances that come along on every trip made on it. */
export const rigLoadsSchema = z
  .array(applianceFieldsSchema)
  .max(LIMITS.appliancesPerTrip, { error: `At most ${LIMITS.appliancesPerTrip} appliances on a rig.` });
/** One of My rigs: the rig and its usual loads. */
export const savedRigRecordSchema = rigRecordSchema.extend({ loads: rigLoadsSchema });
export type SavedRigRecord = z.infer<typeof savedRigRecordSchema>;

export const stopRecordSchema = z.object({ id: idSchema, version: versionSchema, notes: z.string(), stop: stopSchema });
export type StopRecord = z.infer<typeof stopRecordSchema>;

export const driveRecordSchema = z.object({ id: idSchema, version: versionSchema, drive: driveSchema });
export type DriveRecord = z.infer<typeof driveRecordSchema>;

export const applianceRecordSchema = z.object({
  id: idSchema,
  version: versionSchema,
  /** The member who looks after this appliance's routine, if any. */
  caretakerUserId: z.string().nullable(),
  appliance: applianceSchema,
});
export type ApplianceRecord = z.infer<typeof applianceRecordSchema>;

/** `email` is left out for readers who see the trip only through a club: they get names, not addresses. */
export const memberSchema = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string().optional(),
  role: roleSchema,
});
export type Member = z.infer<typeof memberSchema>;

export const tripDetailSchema = z.object({
  trip: tripSummarySchema.extend({ notes: z.string(), ownerId: z.string(), role: roleSchema }),
  rig: rigRecordSchema,
  /** In route order; drives[i] goes from stops[i] to stops[i + 1]. */
  stops: z.array(stopRecordSchema),
  drives: z.array(driveRecordSchema),
  appliances: z.array(applianceRecordSchema),
  /** Set on a member's copy of a club's trip. */
  basedOn: basedOnSchema.nullable().optional(),
});
export type TripDetail = z.infer<typeof tripDetailSchema>;

export const activityEntrySchema = z.object({
  id: z.string(),
  at: z.string(),
  userId: z.string().nullable(),
  userName: z.string().nullable(),
  summary: z.string(),
});
export type ActivityEntry = z.infer<typeof activityEntrySchema>;

// ---- requests ----
const tripFieldsSchema = z.object({
  name: nameText(120, { empty: 'Give the trip a name.' }),
  startDate: isoDateSchema,
  endDate: isoDateSchema,
  timeZone: timeZoneSchema,
  notes: z.string().max(4000),
});

export const createTripRequestSchema = tripFieldsSchema
  .extend({
    notes: z.string().max(4000).default(''),
    /** Start from one of My rigs (copied onto the trip) or from a preset rig. */
    rigSource: z.discriminatedUnion('kind', [
      z.object({ kind: z.literal('saved'), rigId: idSchema }),
      z.object({ kind: z.literal('preset'), presetId: z.string().min(1).max(64) }),
    ]),
  })
  .strict()
  .refine((t) => t.endDate >= t.startDate, {
    message: 'The trip must end on or after its first day.',
    path: ['endDate'],
  })
  .refine((t) => t.endDate < t.startDate || tripDayCount(t.startDate, t.endDate) <= LIMITS.tripDays, {
    message: `A trip lasts at most ${LIMITS.tripDays} days.`,
    path: ['endDate'],
    params: fieldRule(LIMITS.tripDays),
  });
export type CreateTripRequest = z.input<typeof createTripRequestSchema>;

// No defaults here: a field left out of an update stays as it is.
export const updateTripRequestSchema = tripFieldsSchema.partial().extend({ version: versionSchema }).strict();
export type UpdateTripRequest = z.input<typeof updateTripRequestSchema>;

export const createRigRequestSchema = z.object({ rig: rigSchema, loads: rigLoadsSchema.default([]) }).strict();
export const updateRigLoadsRequestSchema = z.object({ version: versionSchema, loads: rigLoadsSchema }).strict();
export const updateRigRequestSchema = z.object({ version: versionSchema, rig: rigSchema }).strict();
export const replaceTripRigRequestSchema = z.object({ version: versionSchema, rigId: idSchema }).strict();
export const saveTripRigRequestSchema = z.object({ name: nameText(120, { empty: 'Give the rig a name.' }) }).strict();

export const createStopRequestSchema = z.object({ stop: stopSchema, notes: z.string().max(4000).default('') }).strict();
/** notes left out: kept as they are. */
export const updateStopRequestSchema = z
  .object({ version: versionSchema, stop: stopSchema, notes: z.string().max(4000).optional() })
  .strict();
export const reorderStopsRequestSchema = z
  .object({ tripVersion: versionSchema, stopIds: z.array(idSchema).min(1).max(LIMITS.stopsPerTrip) })
  .strict();

export const updateDriveRequestSchema = z.object({ version: versionSchema, drive: driveSchema }).strict();

export const createApplianceRequestSchema = z
  .object({ appliance: applianceFieldsSchema, caretakerUserId: idSchema.nullable().default(null) })
  .strict();
/** caretakerUserId left out: kept as it is; null clears it. */
export const updateApplianceRequestSchema = z
  .object({
    version: versionSchema,
    appliance: applianceFieldsSchema,
    caretakerUserId: idSchema.nullable().optional(),
  })
  .strict();
export const updateScheduleRequestSchema = z.object({ version: versionSchema, schedule: scheduleSchema }).strict();

export const updateMemberRoleRequestSchema = z.object({ role: roleSchema }).strict();

/**
 * The load scale a calibration may fit: a fifth to five times the planned draws. Past either end the readings say
 * more about a wrong reading or a missing appliance than about how hard the loads run.
 */
export const LOAD_SCALE_RANGE = [0.2, 5] as const;

/**
 * Use what we saw: one stop's sky openness and a scale on every appliance's draws, fitted to the check-ins, saved
 * together. Every appliance of the trip is named with the version it was fitted on, so a load added, removed or
 * changed since makes the whole calibration stale (409) rather than scaling a list nobody saw.
 */
export const applyCalibrationRequestSchema = z
  .object({
    stopId: idSchema,
    stopVersion: versionSchema,
    skyOpennessPct: percentSchema,
    loadScale: z.number().min(LOAD_SCALE_RANGE[0]).max(LOAD_SCALE_RANGE[1]),
    appliances: z
      .array(z.object({ id: idSchema, version: versionSchema }).strict())
      .max(LIMITS.appliancesPerTrip)
      .refine((list) => new Set(list.map((a) => a.id)).size === list.length, {
        message: 'Name each appliance once.',
        params: fieldRule(),
      }),
  })
  .strict();
export type ApplyCalibrationRequest = z.infer<typeof applyCalibrationRequestSchema>;

/** Undo of an accepted calibration: the stop's exposure and each appliance's draws as they were, with versions. */
const undoCalibrationSchema = z
  .object({
    kind: z.literal('calibration'),
    stop: z
      .object({
        stopId: idSchema,
        version: versionSchema,
        restore: z.object({ version: versionSchema, exposure: siteExposureSchema }).strict(),
      })
      .strict(),
    appliances: z
      .array(
        z
          .object({
            applianceId: idSchema,
            version: versionSchema,
            restore: z.object({ version: versionSchema, runningW: runningWSchema, standbyW: standbyWSchema }).strict(),
          })
          .strict(),
      )
      .max(LIMITS.appliancesPerTrip),
  })
  .strict();

/**
 * Undo of an applied fix: the record as it was before (its content and its version), sent with the version it has
 * now. The server writes it back only if nothing changed it since (else 409), and only backwards in versions.
 */
export const undoFixRequestSchema = z.discriminatedUnion('kind', [
  z
    .object({
      kind: z.literal('rig'),
      version: versionSchema,
      restore: z.object({ version: versionSchema, rig: rigSchema }).strict(),
    })
    .strict(),
  z
    .object({
      kind: z.literal('stop'),
      stopId: idSchema,
      version: versionSchema,
      restore: z.object({ version: versionSchema, stop: stopSchema, notes: z.string().max(4000) }).strict(),
    })
    .strict(),
  z
    .object({
      kind: z.literal('appliance'),
      applianceId: idSchema,
      version: versionSchema,
      restore: z.object({ version: versionSchema, schedule: scheduleSchema }).strict(),
    })
    .strict(),
  undoCalibrationSchema,
]);
export type UndoFixRequest = z.input<typeof undoFixRequestSchema>;
