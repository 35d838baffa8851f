export type TimeOfDayFieldProps = {
  label: string;
  hour: number;
  minute: number;
  /** Called with a whole hour (0–23) and a minute on the field's step. */
  onChange: (hour: number, minute: number) => void;
  /** Minutes between choices; 5 unless told. */
  stepMinutes?: number;
  editable?: boolean;
  testID: string;
};

const pad = (n: number) => String(n).padStart(2, '0');

export const formatClock = (hour: number, minute: number) => `${pad(hour)}:${pad(minute)}`;

/** A minute rounded to the step, kept inside the hour. */
export const snapMinute = (minute: number, stepMinutes: number) =>
  Math.max(0, Math.min(60 - stepMinutes, Math.round(minute / stepMinutes) * stepMinutes));

/** "07:35" → [7, 35], snapped to the step; null for anything that is not a time of day. */
export function parseClock(text: string, stepMinutes = 5): [number, number] | null {
  const match = /^(\d{1,2}):(\d{2})/.exec(text.trim());
  if (!match) return null;
  const hour = Number(match[1]);
  const minute = Number(match[2]);
  if (hour > 23 || minute > 59) return null;
  return [hour, snapMinute(minute, stepMinutes)];
}
