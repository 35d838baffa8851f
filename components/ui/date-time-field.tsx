import { TextField } from './text-field';
import { describeInLocale, type DateTimeFieldProps } from './date-time-field.types';

const TYPED_FORMAT = { date: 'YYYY-MM-DD', datetime: 'YYYY-MM-DD HH:MM' } as const;

/** Native platforms: the day (and time) typed, with the choice repeated in words once it reads as one. */
export function DateTimeField({ kind, value, onChange, hint, editable = true, ...rest }: DateTimeFieldProps) {
  return (
    <TextField
      {...rest}
      editable={editable}
      value={value}
      onChangeText={onChange}
      hint={describeInLocale(value, kind) || hint || TYPED_FORMAT[kind]}
    />
  );
}
