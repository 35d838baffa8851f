import { describe, expect, it } from 'vitest';
import { dataAge } from '@/components/offline/data-age';

describe('data age', () => {
  const now = Date.parse('2027-09-14T18:00:00Z');
  it.each([
    [20_000, 'just now'],
    [12 * 60_000, '12 min ago'],
    [3 * 3_600_000, '3 h ago'],
    [3 * 86_400_000, '3 days ago'],
  ])('when the data was saved %d ms ago, then it reads "%s"', (ago, text) => {
    expect(dataAge(now - ago, now)).toBe(text);
  });
});
