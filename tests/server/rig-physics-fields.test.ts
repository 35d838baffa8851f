// The rig's living space, the inverter's hours, a stop's sky openness and a thermostat's efficiency go through the
// API to the database and back, and reach the engine; trips saved before them keep working on their defaults.
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { simulateTrip } from '@/shared/engine';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { addAppliance, addStop, createTrip, getDetail, stopOnNextFreeDay } from '../factories/trip-factory';

let ctx: TestContext;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

describe('new rig, stop and thermostat fields', () => {
  it('when a trip is made from a preset, then its rig has the preset’s living space and the defaults fill the rest', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { rig } = await createTrip(agent);
    expect(rig.rig.cabin).toEqual({ lengthM: 6, widthM: 2.3, heightM: 2.1, insulation: 'standard', occupants: 2 });
  });

  it('when the living space, inverter hours, sky openness and thermostat efficiency are saved, then they come back and the budget uses them', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const detail = await createTrip(agent);
    const cabin = { lengthM: 7.3, widthM: 2.4, heightM: 2.3, insulation: 'four-season', occupants: 4 };
    const inverter = {
      ratedW: 2000,
      efficiency: 0.9,
      idleW: 12,
      mode: 'scheduled',
      onHours: { startHour: 7, endHour: 22 },
    };
    const saved = await agent
      .put(`/api/trips/${detail.trip.id}/rig`)
      .send({ version: detail.rig.version, rig: { ...detail.rig.rig, cabin, inverter } })
      .expect(200);
    expect(saved.body.rig.cabin).toEqual(cabin);
    expect(saved.body.rig.inverter).toMatchObject({ mode: 'scheduled', onHours: { startHour: 7, endHour: 22 } });

    const exposure = { kind: 'canopy', skyOpennessPct: 38, leafAreaIndex: 4, deciduous: true };
    await addStop(agent, detail.trip.id, { ...stopOnNextFreeDay(), exposure } as never);
    await addAppliance(agent, detail.trip.id, {
      name: 'Heater',
      circuit: 'dc',
      quantity: 1,
      runningW: 15,
      standbyW: 0,
      dutyCycle: 1,
      heatInputW: 0,
      schedule: { kind: 'thermostat', mode: 'heating', setPointC: 19, efficiency: 0.9, capacityW: 2000 },
    });
    const after = await getDetail(agent, detail.trip.id);
    expect(after.rig.rig.cabin).toEqual(cabin);
    expect(after.stops[0]?.stop.exposure).toEqual(exposure);
    expect(after.appliances[0]?.appliance.schedule).toMatchObject({ efficiency: 0.9, capacityW: 2000 });

    const input = toEngineInput(after);
    if (!input) throw new Error('no input');
    const budget = (await agent.get(`/api/trips/${detail.trip.id}/budget`).expect(200)).body;
    expect(budget.result.headline).toEqual(simulateTrip(input).headline);
    // The heater follows the four-season cabin's balance: the ledger shows the cabin held at its set point at night.
    const { ledger } = (await agent.get(`/api/trips/${detail.trip.id}/ledger`).expect(200)).body;
    expect(ledger.cabinC.some((cabinC: number) => Math.abs(cabinC - 19) < 1e-9)).toBe(true);
  });

  it('when a roof area and a portable array are saved, then they come back as saved', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const detail = await createTrip(agent);
    const cabin = { ...detail.rig.rig.cabin, roofAreaM2: 7.5 };
    const solarArrays = [
      ...detail.rig.rig.solarArrays,
      { name: 'Ground panel', ratedW: 200, mounting: 'flat', tiltDeg: 0, portable: true },
    ];
    const saved = await agent
      .put(`/api/trips/${detail.trip.id}/rig`)
      .send({ version: detail.rig.version, rig: { ...detail.rig.rig, cabin, solarArrays } })
      .expect(200);
    expect(saved.body.rig.cabin.roofAreaM2).toBe(7.5);
    const after = await getDetail(agent, detail.trip.id);
    expect(after.rig.rig.cabin.roofAreaM2).toBe(7.5);
    expect(after.rig.rig.solarArrays.at(-1)).toMatchObject({ name: 'Ground panel', portable: true });
  });

  it('when a scheduled inverter has no hours, then the API refuses it (a rule between fields: 422) naming the hours', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const detail = await createTrip(agent);
    const response = await agent
      .put(`/api/trips/${detail.trip.id}/rig`)
      .send({ version: detail.rig.version, rig: { ...detail.rig.rig, inverter: { ratedW: 2000, mode: 'scheduled' } } })
      .expect(422);
    expect(JSON.stringify(response.body.error)).toMatch(/onHours/);
  });
});
