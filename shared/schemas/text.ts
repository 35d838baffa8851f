// Free text that people name things with: trips, stops, appliances, rigs, clubs and themselves.
import { z } from 'zod';
import './plain-errors';

// No C0 or C1 control characters (tabs, line breaks, escapes, NUL…) and no Unicode line or paragraph
// separators: a name is one line of visible text. Explicit ranges rather than \p{…}, so every JS engine
// the app runs on reads the patterns the same way.
// eslint-disable-next-line no-control-regex -- matching control characters is the point
const WITHOUT_CONTROL_CHARACTERS = /^[^\u0000-\u001F\u007F-\u009F\u2028\u2029]*$/;
// Every surrogate in a pair: half a pair is not a character at all and cannot be written as UTF-8.
const WELL_FORMED_UTF16 = /^(?:[^\uD800-\uDFFF]|[\uD800-\uDBFF][\uDC00-\uDFFF])*$/;

export const NAME_MESSAGES = {
  empty: 'Give it a name.',
  control: 'Use visible characters only: no line breaks, tabs or control characters.',
  surrogate: 'This text holds a broken character. Please type it again.',
  tooLong: (max: number) => `At most ${max} characters.`,
} as const;

/**
 * A name: trimmed, then 1…max characters of visible text. `empty` replaces the message for a blank
 * name, so a form can say what is missing ("Give the trip a name."). The refusals are format errors
 * (400), not rules between fields.
 */
export function nameText(max: number, messages: { empty?: string } = {}) {
  return z
    .string()
    .trim()
    .min(1, { error: messages.empty ?? NAME_MESSAGES.empty })
    .max(max, { error: NAME_MESSAGES.tooLong(max), abort: true })
    .regex(WITHOUT_CONTROL_CHARACTERS, { error: NAME_MESSAGES.control })
    .regex(WELL_FORMED_UTF16, { error: NAME_MESSAGES.surrogate });
}
