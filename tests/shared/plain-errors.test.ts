import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { createTripRequestSchema } from '@/shared/schemas/api';
import { applianceFieldsSchema } from '@/shared/schemas/appliance';
import { localHourSchema } from '@/shared/schemas/common';
import { unitOfField } from '@/shared/schemas/plain-errors';
import { batterySchema, solarArraySchema } from '@/shared/schemas/rig';
import { hookupSchema } from '@/shared/schemas/trip';

/** The message zod gives for the field at `path` (joined with dots), after the whole value was checked. */
function messageAt(schema: z.ZodType, value: unknown, path: string): string | undefined {
  const result = schema.safeParse(value);
  return result.error?.issues.find((issue) => issue.path.join('.') === path)?.message;
}

const VALID_ARRAY = { ratedW: 200 };
const VALID_APPLIANCE = { name: 'Fridge', circuit: 'dc', runningW: 45, schedule: { kind: 'always' } };
const VALID_TRIP = {
  name: 'Coast run',
  startDate: '2027-09-12',
  endDate: '2027-09-15',
  timeZone: 'Europe/London',
  rigSource: { kind: 'preset', presetId: 'van' },
};

describe('the plain-language error map', () => {
  it('when a watt figure must be above zero and is zero, then it says "Enter more than 0 W."', () => {
    expect(messageAt(solarArraySchema, { ...VALID_ARRAY, ratedW: 0 }, 'ratedW')).toBe('Enter more than 0 W.');
  });

  it('when amps are zero on a hookup, then the unit comes from the field name', () => {
    expect(messageAt(hookupSchema, { amps: 0, volts: 230 }, 'amps')).toBe('Enter more than 0 A.');
  });

  it('when a running load is negative, then it asks for 0 W or more', () => {
    expect(messageAt(applianceFieldsSchema, { ...VALID_APPLIANCE, runningW: -5 }, 'runningW')).toBe(
      'Enter 0 W or more.',
    );
  });

  it('when a battery voltage is past its top, then it names the limit with its unit', () => {
    expect(messageAt(batterySchema, { chemistry: 'lifepo4', capacityAh: 100, nominalV: 72 }, 'nominalV')).toBe(
      'Enter at most 60 V.',
    );
  });

  it('when a trip name is too long, then it says "At most 120 characters."', () => {
    expect(messageAt(createTripRequestSchema, { ...VALID_TRIP, name: 'x'.repeat(121) }, 'name')).toBe(
      'At most 120 characters.',
    );
  });

  it('when a schema has no message of its own for an empty name, then it says "Give it a name."', () => {
    const schema = z.object({ clubName: z.string().min(1) });
    expect(messageAt(schema, { clubName: '' }, 'clubName')).toBe('Give it a name.');
  });

  it('when a schema names its own message, then that message is kept', () => {
    expect(messageAt(createTripRequestSchema, { ...VALID_TRIP, name: '  ' }, 'name')).toBe('Give the trip a name.');
  });

  it('when a number is missing or not whole, then it asks for a number in words', () => {
    expect(messageAt(hookupSchema, { volts: 230 }, 'amps')).toBe('Enter a number.');
    expect(messageAt(localHourSchema, 7.5, '')).toBe('Enter a whole number.');
  });

  it('when a choice is not one of the options, then it asks to choose one', () => {
    expect(messageAt(batterySchema, { chemistry: 'nickel', capacityAh: 100, nominalV: 12 }, 'chemistry')).toBe(
      'Choose one of the options.',
    );
  });

  it('when any schema refuses a value, then no validator wording is left in the messages', () => {
    const results = [
      solarArraySchema.safeParse({ ratedW: -1, tiltDeg: 'flat', noctC: 100 }),
      applianceFieldsSchema.safeParse({ name: '', circuit: 'x', runningW: 1e9, quantity: 0.5, schedule: {} }),
      createTripRequestSchema.safeParse({ name: 3, startDate: 'soon', extra: true }),
    ];
    const messages = results.flatMap((r) => r.error?.issues.map((issue) => issue.message) ?? []);
    expect(messages.length).toBeGreaterThan(8);
    for (const message of messages) expect(message).not.toMatch(/expected|Too small|Too big|Invalid input|>=|<=/);
  });
});

describe('unitOfField', () => {
  it.each([
    [['ratedW'], 'W'],
    [['battery', 'capacityAh'], 'Ah'],
    [['lowC'], '°C'],
    [['gammaPctPerC'], '%/°C'],
    [['tiltDeg'], '°'],
    [['distanceKm'], 'km'],
    [['name'], ''],
    [['W'], ''],
    [[0], ''],
  ])('when the field is %j, then the unit is "%s"', (path, unit) => {
    expect(unitOfField(path)).toBe(unit);
  });
});
