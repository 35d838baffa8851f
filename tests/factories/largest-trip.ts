import type { Agent } from 'supertest';
import type { TripDetail } from '@/shared/schemas/api';
import { LARGEST_TRIP, largestAppliances, largestRig, largestStops } from './largest-plan';
import { createTrip, getDetail } from './trip-factory';

async function expectStatus(
  what: string,
  request: Promise<{ status: number; text: string }>,
  status: number,
): Promise<void> {
  const response = await request;
  if (response.status !== status) throw new Error(`${what}: ${response.status} ${response.text.slice(0, 300)}`);
}

/**
 * Stores the largest plan through the API, part by part (each at its maximum), and returns the stored trip. Any
 * part the API refused would throw: the plan the benchmark times is one the API really accepts.
 */
export async function createLargestTrip(agent: Agent): Promise<TripDetail> {
  const { trip, rig } = await createTrip(agent, { name: 'Largest plan', ...LARGEST_TRIP });
  await expectStatus(
    'rig',
    agent.put(`/api/trips/${trip.id}/rig`).send({ version: rig.version, rig: largestRig() }),
    200,
  );
  for (const stop of largestStops())
    await expectStatus('stop', agent.post(`/api/trips/${trip.id}/stops`).send({ stop }), 201);
  for (const appliance of largestAppliances())
    await expectStatus('appliance', agent.post(`/api/trips/${trip.id}/appliances`).send({ appliance }), 201);
  return getDetail(agent, trip.id);
}
