import { and, count, eq, inArray } from 'drizzle-orm';
import { DateTime } from 'luxon';
import { DEMO_TRIPS } from '@/shared/engine';
import { applianceFieldsSchema } from '@/shared/schemas/appliance';
import { engineInputSchema, type EngineInputDraft } from '@/shared/schemas/engine-input';
import type { Role } from '@/shared/schemas/roles';
import type { Db } from './client';
import { insertAppliance } from './queries/appliances';
import { addMember } from './queries/members';
import { insertStop, listStopRows } from './queries/stops';
import { insertRig, insertTrip, logActivity } from './queries/trips';
import { user } from './schema/auth';
import { drives } from './schema/drives';
import { appliances } from './schema/appliances';

// Invented accounts for trying the app locally; never created when NODE_ENV=production.
export const DEMO_PASSWORD = 'demo-trailtally';
export const DEMO_ACCOUNT = { name: 'Demo Planner', email: 'demo@trailtally.test', password: DEMO_PASSWORD } as const;
export const DEMO_CREW = { name: 'Demo Crew', email: 'crew@trailtally.test', password: DEMO_PASSWORD } as const;
export const DEMO_VIEWER = { name: 'Demo Viewer', email: 'viewer@trailtally.test', password: DEMO_PASSWORD } as const;

/** What seeding needs of the auth service: creating an account with a real password hash. */
export type AccountCreator = {
  api: {
    signUpEmail: (request: {
      body: { name: string; email: string; password: string };
    }) => Promise<{ user: { id: string } }>;
  };
};

export function isDatabaseEmpty(db: Db): boolean {
  const row = db.select({ users: count() }).from(user).get();
  return (row?.users ?? 0) === 0;
}

/** Stores one engine input as a trip: its rig copy, stops, drives and appliances with routines. */
export function insertTripFromEngineInput(db: Db, ownerId: string, draft: EngineInputDraft, now: Date): string {
  const input = engineInputSchema.parse(draft);
  const first = input.trip.stops[0];
  const last = input.trip.stops[input.trip.stops.length - 1];
  if (!first || !last) throw new Error('A demo trip needs stops.');
  const zone = first.timeZone;
  const dateIn = (iso: string) => DateTime.fromISO(iso, { zone }).toISODate() ?? iso.slice(0, 10);
  return db.transaction((tx) => {
    const trip = insertTrip(
      tx,
      {
        ownerId,
        name: input.trip.name,
        startDate: dateIn(first.arriveAt),
        endDate: dateIn(last.departAt),
        timeZone: zone,
      },
      now,
    );
    insertRig(tx, { ownerId, tripId: trip.id }, input.rig, now);
    for (const stop of input.trip.stops) insertStop(tx, trip.id, stop, '');
    listStopRows(tx, trip.id).forEach((_row, i) => {
      const drive = input.trip.drives[i];
      if (drive)
        tx.update(drives)
          // The demo's hours are the plan's own, not a suggestion to follow the stops.
          .set({ ...drive, hoursSource: drive.hoursSource ?? 'typed' })
          .where(and(eq(drives.tripId, trip.id), eq(drives.position, i)))
          .run();
    });
    for (const { id: _id, ...fields } of input.appliances)
      insertAppliance(tx, trip.id, applianceFieldsSchema.parse(fields), null);
    logActivity(tx, { tripId: trip.id, userId: ownerId, summary: `created the trip "${trip.name}"`, at: now });
    return trip.id;
  });
}

/**
 * Creates the demo accounts (through better-auth, so their password hashes are real) and the two
 * demo trips; on the Highland loop the crew account looks after the hair dryer and a viewer reads along.
 */
export async function seedDemo(db: Db, auth: AccountCreator, now: Date): Promise<void> {
  const planner = await auth.api.signUpEmail({ body: { ...DEMO_ACCOUNT } });
  const crew = await auth.api.signUpEmail({ body: { ...DEMO_CREW } });
  const viewer = await auth.api.signUpEmail({ body: { ...DEMO_VIEWER } });
  const highland = insertTripFromEngineInput(db, planner.user.id, DEMO_TRIPS.highlandLoop, now);
  insertTripFromEngineInput(db, planner.user.id, DEMO_TRIPS.desertSpringLoop, now);
  const members: [string, Role][] = [
    [crew.user.id, 'crew'],
    [viewer.user.id, 'viewer'],
  ];
  db.transaction((tx) => {
    // Invented addresses cannot receive a confirmation e-mail; count them as confirmed.
    tx.update(user)
      .set({ emailVerified: true })
      .where(inArray(user.id, [planner.user.id, crew.user.id, viewer.user.id]))
      .run();
    for (const [userId, role] of members) addMember(tx, highland, userId, role, now);
    tx.update(appliances)
      .set({ caretakerUserId: crew.user.id })
      .where(and(eq(appliances.tripId, highland), eq(appliances.name, 'Hair dryer')))
      .run();
  });
}

export function demoSignInText(): string {
  return `Demo accounts (password ${DEMO_PASSWORD}): ${DEMO_ACCOUNT.email} (planner and owner), ${DEMO_CREW.email} (crew), ${DEMO_VIEWER.email} (viewer)`;
}
