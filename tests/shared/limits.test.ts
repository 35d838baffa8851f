// The bounds in the shared schemas, as the forms and the engine see them (the API's answers are in tests/server).
import { describe, expect, it } from 'vitest';
import { dayIndexesSchema, timeZoneSchema } from '@/shared/schemas/common';
import { isFieldRuleIssue, LIMITS, tripDayCount } from '@/shared/schemas/limits';

describe('day lists of routine windows', () => {
  it.each([
    ['the first day', [0]],
    ['the last day a longest trip can touch', [LIMITS.tripDays]],
    ['every day once', Array.from({ length: LIMITS.tripDays + 1 }, (_, day) => day)],
  ])('when a window names %s, then it is taken', (_what, days) => {
    expect(dayIndexesSchema.safeParse(days).success).toBe(true);
  });

  it.each([
    ['no day', []],
    ['a day twice', [3, 3]],
    ['a day past the longest trip', [LIMITS.tripDays + 1]],
    ['a negative day', [-1]],
    ['half a day', [1.5]],
    ['a day as text', ['1']],
    ['49,000 days', new Array<number>(49_000).fill(0)],
    ['not a list', 7],
  ])('when a window names %s, then it is refused as a rule about that field alone (400)', (_what, days) => {
    const result = dayIndexesSchema.safeParse(days);
    expect(result.success).toBe(false);
    expect(result.error?.issues.every(isFieldRuleIssue)).toBe(true);
  });
});

describe('trip length', () => {
  it.each([
    ['2027-06-01', '2027-06-01', 1],
    ['2027-06-01', '2027-09-28', 120],
    ['2027-03-27', '2027-03-29', 3],
    ['2027-12-31', '2028-01-01', 2],
  ])('when a trip runs from %s to %s, then it has %i days', (start, end, days) => {
    expect(tripDayCount(start, end)).toBe(days);
  });
});

describe('time zones', () => {
  it('when a zone name is longer than any real one, then it is refused before it is looked up', () => {
    expect(timeZoneSchema.safeParse('Europe/London').success).toBe(true);
    expect(timeZoneSchema.safeParse(`Europe/${'x'.repeat(5_000)}`).success).toBe(false);
  });
});
