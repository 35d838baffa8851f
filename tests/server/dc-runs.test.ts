// The rig's DC runs through the API: stored with the trip's rig copy and with My rigs, bounded by the shared
// schema (400 naming the field), held to the rig's version and roles like any other rig edit.
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { rigs } from '@/db/schema/rigs';
import { suggestedDcRuns } from '@/shared/engine/dc-run-defaults';
import type { RigRecord } from '@/shared/schemas/api';
import { MAX_DC_RUNS, type DcRun, type DcWiring } from '@/shared/schemas/dc-wiring';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { createTrip, getDetail, grant } from '../factories/trip-factory';

let ctx: TestContext;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

const INVERTER_RUN: DcRun = {
  kind: 'battery-inverter',
  name: 'Battery to inverter',
  lengthM: 1.2,
  size: { unit: 'mm2', mm2: 70 },
  insulationC: 105,
  tinned: true,
  engineSpace: false,
  critical: true,
  protection: { kind: 'fuse', amps: 250 },
};
const FRIDGE_RUN: DcRun = {
  kind: 'dc-load',
  name: 'Fridge',
  lengthM: 4,
  size: { unit: 'awg', awg: '12' },
  insulationC: 90,
  tinned: false,
  engineSpace: false,
  critical: false,
  protection: { kind: 'breaker', amps: 10 },
  loadW: 60,
  surgeW: 180,
};
const WIRING: DcWiring = { basis: 'nfpa70', runs: [INVERTER_RUN, FRIDGE_RUN] };

async function tripWithRig() {
  const owner = await signUpAgent(ctx.app, 'Owner');
  const detail = await createTrip(owner.agent);
  return { owner, detail, path: `/api/trips/${detail.trip.id}/rig` };
}

describe('DC runs on the rig', () => {
  it('when a new trip starts from a preset, then its rig has no runs and the ABYC basis', async () => {
    const { detail } = await tripWithRig();
    expect(detail.rig.rig.dcWiring).toEqual({ basis: 'abyc-e11', runs: [] });
  });

  it('when the owner saves runs with the rig, then they come back as sent and the version moves on', async () => {
    const { owner, detail, path } = await tripWithRig();
    const response = await owner.agent
      .put(path)
      .send({ version: detail.rig.version, rig: { ...detail.rig.rig, dcWiring: WIRING } });
    expect(response.status).toBe(200);
    expect((response.body as RigRecord).version).toBe(detail.rig.version + 1);
    const stored = await getDetail(owner.agent, detail.trip.id);
    expect(stored.rig.rig.dcWiring).toEqual(WIRING);
  });

  it.each([
    ['lengthM', { ...INVERTER_RUN, lengthM: 500 }, 'rig.dcWiring.runs.0.lengthM'],
    ['size', { ...INVERTER_RUN, size: { unit: 'awg', awg: '5' } }, 'rig.dcWiring.runs.0.size.awg'],
    ['mm²', { ...INVERTER_RUN, size: { unit: 'mm2', mm2: 3 } }, 'rig.dcWiring.runs.0.size.mm2'],
    ['insulation', { ...INVERTER_RUN, insulationC: 80 }, 'rig.dcWiring.runs.0.insulationC'],
    ['fuse', { ...INVERTER_RUN, protection: { kind: 'fuse', amps: 5000 } }, 'rig.dcWiring.runs.0.protection.amps'],
    ['kind', { ...INVERTER_RUN, kind: 'battery-toaster' }, 'rig.dcWiring.runs.0.kind'],
  ])('when a run has a bad %s, then 400 names the field and nothing is stored', async (_what, bad, field) => {
    const { owner, detail, path } = await tripWithRig();
    const response = await owner.agent
      .put(path)
      .send({ version: detail.rig.version, rig: { ...detail.rig.rig, dcWiring: { basis: 'abyc-e11', runs: [bad] } } });
    expect(response.status).toBe(400);
    expect(response.body.error.code).toBe('validation_failed');
    expect(Object.keys(response.body.error.fields as Record<string, string[]>)).toContain(field);
    expect((await getDetail(owner.agent, detail.trip.id)).rig.version).toBe(detail.rig.version);
  });

  it('when more runs than a rig may hold are sent, then 400 names the runs list', async () => {
    const { owner, detail, path } = await tripWithRig();
    const runs = Array.from({ length: MAX_DC_RUNS + 1 }, (_, i) => ({ ...FRIDGE_RUN, name: `Circuit ${i}` }));
    const response = await owner.agent
      .put(path)
      .send({ version: detail.rig.version, rig: { ...detail.rig.rig, dcWiring: { basis: 'abyc-e11', runs } } });
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toHaveProperty(['rig.dcWiring.runs']);
  });

  it('when a DC load circuit has no watts, then the answer names loadW', async () => {
    const { owner, detail, path } = await tripWithRig();
    const { loadW: _loadW, ...noWatts } = FRIDGE_RUN;
    const response = await owner.agent.put(path).send({
      version: detail.rig.version,
      rig: { ...detail.rig.rig, dcWiring: { basis: 'abyc-e11', runs: [noWatts] } },
    });
    expect(response.status).toBe(422);
    expect(response.body.error.fields).toHaveProperty(['rig.dcWiring.runs.0.loadW']);
  });

  it('when crew or a viewer send runs, then 403; when the version is stale, then 409 with the stored rig', async () => {
    const { owner, detail, path } = await tripWithRig();
    const crew = await signUpAgent(ctx.app, 'Crew');
    const viewer = await signUpAgent(ctx.app, 'Viewer');
    grant(ctx.db, detail.trip.id, crew.userId, 'crew');
    grant(ctx.db, detail.trip.id, viewer.userId, 'viewer');
    const body = { version: detail.rig.version, rig: { ...detail.rig.rig, dcWiring: WIRING } };
    expect((await crew.agent.put(path).send(body)).status).toBe(403);
    expect((await viewer.agent.put(path).send(body)).status).toBe(403);

    expect((await owner.agent.put(path).send(body)).status).toBe(200);
    const stale = await owner.agent.put(path).send(body);
    expect(stale.status).toBe(409);
    expect((stale.body.current as RigRecord).rig.dcWiring).toEqual(WIRING);
  });

  it('when the trip’s rig is saved to My rigs and put on another trip, then its runs travel with it', async () => {
    const { owner, detail, path } = await tripWithRig();
    await owner.agent.put(path).send({ version: detail.rig.version, rig: { ...detail.rig.rig, dcWiring: WIRING } });
    const saved = await owner.agent.post(`${path}/save`).send({ name: 'Van with runs' });
    expect(saved.status).toBe(201);
    const mine = (saved.body as { rig: RigRecord }).rig;
    expect(mine.rig.dcWiring).toEqual(WIRING);

    const other = await createTrip(owner.agent, { name: 'Second trip' });
    const replaced = await owner.agent
      .post(`/api/trips/${other.trip.id}/rig/replace`)
      .send({ version: other.rig.version, rigId: mine.id });
    expect(replaced.status).toBe(200);
    expect((replaced.body as RigRecord).rig.dcWiring).toEqual(WIRING);

    const edited = { ...mine.rig, dcWiring: { basis: 'abyc-e11', runs: [INVERTER_RUN] } };
    const put = await owner.agent.put(`/api/rigs/${mine.id}`).send({ version: mine.version, rig: edited });
    expect(put.status).toBe(200);
    expect((put.body as RigRecord).rig.dcWiring.runs).toEqual([INVERTER_RUN]);
  });

  it('when the runs the check suggests for a preset rig are saved as they come, then the API stores them', async () => {
    const { owner, detail, path } = await tripWithRig();
    const runs = suggestedDcRuns(detail.rig.rig, 'abyc-e11', 'mm2', [{ name: 'Fridge', runningW: 60, surgeW: 180 }]);
    expect(runs.length).toBeGreaterThan(3);
    const response = await owner.agent
      .put(path)
      .send({ version: detail.rig.version, rig: { ...detail.rig.rig, dcWiring: { basis: 'abyc-e11', runs } } });
    expect(response.status).toBe(200);
    expect((response.body as RigRecord).rig.dcWiring.runs).toEqual(runs);
  });

  it('when a rig was stored before runs existed (no column value), then it reads as no runs', async () => {
    const { owner, detail } = await tripWithRig();
    ctx.db.update(rigs).set({ dcWiring: null }).run();
    expect((await getDetail(owner.agent, detail.trip.id)).rig.rig.dcWiring).toEqual({ basis: 'abyc-e11', runs: [] });
  });
});
