import type { Agent } from 'supertest';
import { addMember } from '@/db/queries/members';
import type { Db } from '@/db/client';
import type { TripDetail } from '@/shared/schemas/api';
import type { Role } from '@/shared/schemas/roles';
import type { StopInput } from '@/shared/schemas/trip';
import type { ApplianceFields } from '@/shared/schemas/appliance';

type Json = Record<string, unknown>;

/** Creates a trip through the API, on a preset rig, owned by the agent's user. */
export async function createTrip(agent: Agent, overrides: Json = {}): Promise<TripDetail> {
  const response = await agent.post('/api/trips').send({
    name: 'Glen weekend',
    startDate: '2027-06-01',
    endDate: '2027-07-31',
    timeZone: 'Europe/London',
    rigSource: { kind: 'preset', presetId: 'caravan-lithium' },
    ...overrides,
  });
  if (response.status !== 201) throw new Error(`createTrip: ${response.status} ${response.text}`);
  return response.body as TripDetail;
}

let dayCounter = 0;

/** A valid stop on its own day inside June–July 2027, so stops made by one test never overlap. */
export function stopOnNextFreeDay(name = 'Test pitch'): StopInput {
  dayCounter += 1;
  const day = new Date(Date.UTC(2027, 5, 1 + ((dayCounter * 2) % 58)));
  const date = day.toISOString().slice(0, 10);
  const next = new Date(day.getTime() + 86_400_000).toISOString().slice(0, 10);
  return {
    name: `${name} ${dayCounter}`,
    lat: 56.9,
    lon: -5.1,
    timeZone: 'Europe/London',
    arriveAt: `${date}T14:00+01:00`,
    departAt: `${next}T10:00+01:00`,
    lowC: 8,
    highC: 16,
  };
}

export const LIGHTS: ApplianceFields = {
  name: 'Cabin lights',
  circuit: 'dc',
  quantity: 1,
  runningW: 10,
  standbyW: 0,
  dutyCycle: 1,
  heatInputW: 0,
  schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 19, startMinute: 0, minutes: 240 }] },
};

export async function addStop(agent: Agent, tripId: string, stop: StopInput = stopOnNextFreeDay()) {
  const response = await agent.post(`/api/trips/${tripId}/stops`).send({ stop });
  if (response.status !== 201) throw new Error(`addStop: ${response.status} ${response.text}`);
  return response.body as { id: string; version: number };
}

export async function addAppliance(agent: Agent, tripId: string, appliance: ApplianceFields = LIGHTS) {
  const response = await agent.post(`/api/trips/${tripId}/appliances`).send({ appliance });
  if (response.status !== 201) throw new Error(`addAppliance: ${response.status} ${response.text}`);
  return response.body as { id: string; version: number };
}

export async function getDetail(agent: Agent, tripId: string): Promise<TripDetail> {
  const response = await agent.get(`/api/trips/${tripId}`);
  if (response.status !== 200) throw new Error(`getDetail: ${response.status} ${response.text}`);
  return response.body as TripDetail;
}

/** Until invites exist, members are added straight in the database. */
export function grant(db: Db, tripId: string, userId: string, role: Role): void {
  addMember(db, tripId, userId, role, new Date('2026-11-20T10:00:00Z'));
}
