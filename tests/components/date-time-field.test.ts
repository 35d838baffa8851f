import { describe, expect, it } from 'vitest';
import { describeInLocale, fromInputValue, toInputValue } from '@/components/ui/date-time-field.types';

describe('the date and time field', () => {
  it('when a local day and time goes to the browser input and back, then it is unchanged', () => {
    expect(toInputValue('2027-09-12 15:00')).toBe('2027-09-12T15:00');
    expect(fromInputValue(toInputValue('2027-09-12 15:00'))).toBe('2027-09-12 15:00');
    expect(fromInputValue('2027-09-12')).toBe('2027-09-12');
  });

  it('when a choice is said in words, then it follows the locale (day before month in Britain, after in the US)', () => {
    expect(describeInLocale('2027-09-17 13:00', 'datetime', 'en-GB')).toBe('Fri, 17 Sept 2027, 13:00');
    expect(describeInLocale('2027-09-17 13:00', 'datetime', 'en-US')).toBe('Fri, Sep 17, 2027, 1:00 PM');
    expect(describeInLocale('2027-09-17', 'date', 'de-DE')).toBe('Freitag, 17. September 2027');
  });

  it('when nothing valid is chosen yet, then nothing is said', () => {
    expect(describeInLocale('', 'date')).toBe('');
    expect(describeInLocale('2027-13-40 10:00', 'datetime')).toBe('');
  });
});
