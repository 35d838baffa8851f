// Trip records built from the engine's demo inputs, for screen checks that must not depend on the server's data.
import { DEMO_TRIPS, simulateTrip } from '@/shared/engine';
import type { TripDetail } from '@/shared/schemas/api';
import { applianceSchema } from '@/shared/schemas/appliance';
import { rigSchema } from '@/shared/schemas/rig';
import { driveSchema, stopSchema } from '@/shared/schemas/trip';

export function demoDetail(key: keyof typeof DEMO_TRIPS, role: TripDetail['trip']['role'] = 'owner'): TripDetail {
  const input = DEMO_TRIPS[key];
  const first = input.trip.stops[0];
  const last = input.trip.stops[input.trip.stops.length - 1];
  return {
    trip: {
      id: key,
      name: input.trip.name,
      startDate: (first?.arriveAt ?? '').slice(0, 10),
      endDate: (last?.departAt ?? '').slice(0, 10),
      timeZone: first?.timeZone ?? 'UTC',
      version: 1,
      updatedAt: '2027-01-01T00:00:00Z',
      notes: '',
      ownerId: 'u1',
      role,
    },
    rig: { id: `${key}-rig`, version: 1, rig: rigSchema.parse(input.rig) },
    stops: input.trip.stops.map((s, i) => ({ id: `${key}-s${i}`, version: 1, notes: '', stop: stopSchema.parse(s) })),
    drives: (input.trip.drives ?? []).map((d, i) => ({ id: `${key}-d${i}`, version: 1, drive: driveSchema.parse(d) })),
    appliances: (input.appliances ?? []).map((a) => {
      const { id, ...rest } = applianceSchema.parse(a);
      return { id, version: 1, caretakerUserId: null, appliance: { id, ...rest } };
    }),
  };
}

export function demoBudget(key: keyof typeof DEMO_TRIPS) {
  return { version: 1, result: simulateTrip(DEMO_TRIPS[key]) };
}
