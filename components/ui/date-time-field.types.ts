import { DateTime } from 'luxon';

export type DateTimeFieldProps = {
  label: string;
  /** date: a day ("2027-09-12"); datetime: a day and a local time ("2027-09-12 15:00"). */
  kind: 'date' | 'datetime';
  /** The form's value in the format of its kind; '' when nothing is chosen yet. */
  value: string;
  onChange: (value: string) => void;
  onBlur?: () => void;
  error?: string;
  hint?: string;
  editable?: boolean;
  testID: string;
};

const FORM_FORMAT = { date: 'yyyy-MM-dd', datetime: 'yyyy-MM-dd HH:mm' } as const;

/** The form's value as the browser's date or datetime-local input holds it ("2027-09-12T15:00"). */
export const toInputValue = (value: string) => value.replace(' ', 'T');
/** The browser input's value in the form's format. */
export const fromInputValue = (value: string) => value.replace('T', ' ');

/**
 * The chosen day (and time) in the person's own words and locale, e.g. "Sun, 12 Sept 2027, 15:00", for the line
 * under the field; '' while nothing valid is chosen.
 */
export function describeInLocale(value: string, kind: DateTimeFieldProps['kind'], locale?: string): string {
  const t = DateTime.fromFormat(value, FORM_FORMAT[kind], locale ? { locale } : {});
  if (!t.isValid) return '';
  return t.toLocaleString(kind === 'date' ? DateTime.DATE_HUGE : DateTime.DATETIME_MED_WITH_WEEKDAY);
}
