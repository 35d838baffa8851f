import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import { highlandLoop } from '@/shared/engine';
import { signUpSchema, userNameSchema } from '@/shared/schemas/account';
import { createTripRequestSchema, saveTripRigRequestSchema } from '@/shared/schemas/api';
import { applianceFieldsSchema } from '@/shared/schemas/appliance';
import { propaneTankSchema, rigSchema, solarArraySchema } from '@/shared/schemas/rig';
import { copyTripRequestSchema, createClubRequestSchema } from '@/shared/schemas/sharing';
import { NAME_MESSAGES, nameText } from '@/shared/schemas/text';
import { stopSchema, tripSchema } from '@/shared/schemas/trip';

const LONE_HIGH = '\uD83D';
const LONE_LOW = '\uDE00';

describe('nameText', () => {
  const schema = nameText(20);

  it.each([
    ['plain text', 'Coast run', 'Coast run'],
    ['spaces around it', '  Coast run \u00A0', 'Coast run'],
    ['a paired emoji', 'Fridge \uD83E\uDDCA', 'Fridge \uD83E\uDDCA'],
    ['letters from other scripts', 'Öræfi – Þórsmörk', 'Öræfi – Þórsmörk'],
    ['exactly the maximum', 'x'.repeat(20), 'x'.repeat(20)],
    ['the maximum once trimmed', ` ${'x'.repeat(20)} `, 'x'.repeat(20)],
  ])('when a name is %s, then it is kept, trimmed', (_what, input, expected) => {
    expect(schema.parse(input)).toBe(expected);
  });

  it.each([
    ['empty', '', NAME_MESSAGES.empty],
    ['only spaces', '   ', NAME_MESSAGES.empty],
    ['only a tab and a line break', '\t\n', NAME_MESSAGES.empty],
    ['one over the maximum', 'x'.repeat(21), NAME_MESSAGES.tooLong(20)],
    ['a line break inside', 'Coast\nrun', NAME_MESSAGES.control],
    ['a tab inside', 'Coast\trun', NAME_MESSAGES.control],
    ['a NUL', 'Coast\u0000run', NAME_MESSAGES.control],
    ['an escape sequence', 'Coast\u001B[31mrun', NAME_MESSAGES.control],
    ['DEL', 'Coast\u007Frun', NAME_MESSAGES.control],
    ['a C1 control', 'Coast\u0085run', NAME_MESSAGES.control],
    ['a line separator', 'Coast\u2028run', NAME_MESSAGES.control],
    ['a lone high surrogate', `Coast${LONE_HIGH}run`, NAME_MESSAGES.surrogate],
    ['a lone low surrogate', `Coast${LONE_LOW}run`, NAME_MESSAGES.surrogate],
    ['a lone surrogate at the end', `Coast${LONE_HIGH}`, NAME_MESSAGES.surrogate],
    ['two high surrogates', `${LONE_HIGH}${LONE_HIGH}${LONE_LOW}`, NAME_MESSAGES.surrogate],
  ])('when a name is %s, then it is refused with a format error and a plain message', (_what, input, message) => {
    const result = schema.safeParse(input);
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((issue) => issue.message)).toContain(message);
    // Format errors, not rules between fields: the API answers 400 for them.
    expect(result.error?.issues.every((issue) => issue.code !== 'custom')).toBe(true);
  });

  it('when a blank name has its own message, then that message is shown', () => {
    const result = nameText(10, { empty: 'Give the trip a name.' }).safeParse(' ');
    expect(result.error?.issues[0]?.message).toBe('Give the trip a name.');
  });

  it('when a name is megabytes long, then only the length is reported', () => {
    const result = schema.safeParse(`${'x'.repeat(5_000_000)}\n`);
    expect(result.error?.issues.map((issue) => issue.message)).toEqual([NAME_MESSAGES.tooLong(20)]);
  });
});

const stop = highlandLoop.trip.stops[0];
const array = highlandLoop.rig.solarArrays?.[0];
const tank = highlandLoop.rig.propaneTanks?.[0];
const appliance = highlandLoop.appliances?.[0];

/** Every name field in the shared contracts, with a valid record to put a name into. */
const NAME_FIELDS: [string, z.ZodType, (name: string) => unknown, (parsed: unknown) => unknown][] = [
  ['a user', userNameSchema, (name) => name, (parsed) => parsed],
  [
    'a sign-up',
    signUpSchema,
    (name) => ({ name, email: 'a@example.test', password: 'long-enough-pass' }),
    (parsed) => (parsed as { name: string }).name,
  ],
  [
    'a trip (engine)',
    tripSchema,
    (name) => ({ ...highlandLoop.trip, name }),
    (parsed) => (parsed as { name: string }).name,
  ],
  [
    'a new trip',
    createTripRequestSchema,
    (name) => ({
      name,
      startDate: '2027-05-01',
      endDate: '2027-05-03',
      timeZone: 'Europe/London',
      rigSource: { kind: 'preset', presetId: 'x' },
    }),
    (parsed) => (parsed as { name: string }).name,
  ],
  ['a stop', stopSchema, (name) => ({ ...stop, name }), (parsed) => (parsed as { name: string }).name],
  [
    'an appliance',
    applianceFieldsSchema,
    (name) => ({ ...appliance, name }),
    (parsed) => (parsed as { name: string }).name,
  ],
  ['a rig', rigSchema, (name) => ({ ...highlandLoop.rig, name }), (parsed) => (parsed as { name: string }).name],
  ['a saved rig', saveTripRigRequestSchema, (name) => ({ name }), (parsed) => (parsed as { name: string }).name],
  ['a solar array', solarArraySchema, (name) => ({ ...array, name }), (parsed) => (parsed as { name: string }).name],
  ['a propane tank', propaneTankSchema, (name) => ({ ...tank, name }), (parsed) => (parsed as { name: string }).name],
  ['a club', createClubRequestSchema, (name) => ({ name }), (parsed) => (parsed as { name: string }).name],
  [
    "a copy of a club's trip",
    copyTripRequestSchema,
    (name) => ({ rigId: 'r1', name }),
    (parsed) => (parsed as { name: string }).name,
  ],
];

describe('name fields in the shared contracts', () => {
  it.each(NAME_FIELDS)(
    'when %s is named with spaces around it, then the name is trimmed',
    (_what, schema, build, pick) => {
      expect(pick(schema.parse(build('  Shore power  ')))).toBe('Shore power');
    },
  );

  it.each(NAME_FIELDS)(
    'when %s is named with blanks, a control character or a lone surrogate, then it is refused',
    (_what, schema, build) => {
      for (const bad of ['   ', 'Shore\u0000power', 'Shore\npower', `Shore${LONE_HIGH}power`]) {
        const result = schema.safeParse(build(bad));
        expect(result.success, JSON.stringify(bad)).toBe(false);
        expect(result.error?.issues.some((issue) => issue.path.at(-1) === 'name' || issue.path.length === 0)).toBe(
          true,
        );
      }
    },
  );
});
