import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createTestApp, signUpAgent, type TestContext } from '../factories/test-app';
import { createTrip, LIGHTS, stopOnNextFreeDay } from '../factories/trip-factory';

let ctx: TestContext;
beforeEach(() => {
  ctx = createTestApp();
});
afterEach(() => ctx.close());

describe('names through the API', () => {
  it('when a stop is named with spaces around it, then it is stored trimmed', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    const response = await agent
      .post(`/api/trips/${trip.id}/stops`)
      .send({ stop: { ...stopOnNextFreeDay(), name: '  Loch side  ' } });
    expect(response.status).toBe(201);
    expect(response.body.stop.name).toBe('Loch side');
  });

  it.each([
    ['a trip', (agent: TestAgent) => agent.post('/api/trips').send(tripBody('Coast\u0000run')), 'name'],
    ['a club', (agent: TestAgent) => agent.post('/api/clubs').send({ name: 'Rally\nclub' }), 'name'],
    [
      'a stop',
      async (agent: TestAgent) => {
        const { trip } = await createTrip(agent);
        return agent
          .post(`/api/trips/${trip.id}/stops`)
          .send({ stop: { ...stopOnNextFreeDay(), name: '\uD800 pitch' } });
      },
      'stop.name',
    ],
    [
      'an appliance',
      async (agent: TestAgent) => {
        const { trip } = await createTrip(agent);
        return agent.post(`/api/trips/${trip.id}/appliances`).send({ appliance: { ...LIGHTS, name: '   ' } });
      },
      'appliance.name',
    ],
  ])(
    'when %s is named with a control character, a lone surrogate or blanks, then 400 names the field',
    async (_what, send, field) => {
      const { agent } = await signUpAgent(ctx.app);
      const response = await send(agent);
      expect(response.status).toBe(400);
      expect(response.body.error.code).toBe('validation_failed');
      expect(Object.keys(response.body.error.fields)).toContain(field);
    },
  );

  it('when an appliance draws no power and its name is too long, then the API answers in the same plain words as the form', async () => {
    const { agent } = await signUpAgent(ctx.app);
    const { trip } = await createTrip(agent);
    const response = await agent
      .post(`/api/trips/${trip.id}/appliances`)
      .send({ appliance: { ...LIGHTS, name: 'x'.repeat(81), runningW: -1, quantity: 0 } });
    expect(response.status).toBe(400);
    expect(response.body.error.fields).toMatchObject({
      'appliance.name': ['At most 80 characters.'],
      'appliance.runningW': ['Enter 0 W or more.'],
      'appliance.quantity': ['Enter 1 or more.'],
    });
  });
});

type TestAgent = Awaited<ReturnType<typeof signUpAgent>>['agent'];

function tripBody(name: string) {
  return {
    name,
    startDate: '2027-06-01',
    endDate: '2027-06-03',
    timeZone: 'Europe/London',
    rigSource: { kind: 'preset', presetId: 'caravan-lithium' },
  };
}
