// One error map in plain words for every shared schema: the forms and the API show the same sentences, and no
// validator jargon ("Too small: expected number to be >0") ever reaches a person. A schema that names its own
// message keeps it; everything else falls through to this map. It is installed on zod's global configuration
// when this module loads, which every schema module does through `common.ts`, and the server and the app import it
// once at their entry so a schema module reached some other way is covered too.
import { z } from 'zod';

type Issue = z.core.$ZodRawIssue;

/** Units spelled in field names (see `common.ts`), longest first so `PctPerC` is not read as `C`. */
const UNIT_SUFFIXES: readonly (readonly [suffix: string, unit: string])[] = [
  ['PctPerC', '%/°C'],
  ['Wh', 'Wh'],
  ['Ah', 'Ah'],
  ['Km', 'km'],
  ['Kg', 'kg'],
  ['Pct', '%'],
  ['Deg', '°'],
  ['W', 'W'],
  ['V', 'V'],
  ['C', '°C'],
  ['M', 'm'],
];
/** Whole field names that are a unit on their own. */
const UNIT_FIELDS: Record<string, string> = { amps: 'A', volts: 'V', minutes: 'minutes', hours: 'hours' };

/** The unit a field holds, read from its name ("ratedW" → "W"), or '' when the name carries none. */
export function unitOfField(path: readonly PropertyKey[] | undefined): string {
  const last = path?.[path.length - 1];
  if (typeof last !== 'string') return '';
  if (UNIT_FIELDS[last]) return UNIT_FIELDS[last];
  // A suffix counts only after a lower-case letter or digit: "lowC" is Celsius, "C" alone or "ABC" is not.
  for (const [suffix, unit] of UNIT_SUFFIXES) {
    if (
      last.length > suffix.length &&
      last.endsWith(suffix) &&
      /[a-z0-9]/.test(last.charAt(last.length - suffix.length - 1))
    )
      return unit;
  }
  return '';
}

function withUnit(value: number | bigint, unit: string): string {
  const shown = typeof value === 'bigint' ? value.toString() : String(value);
  if (!unit) return shown;
  return unit === '°' ? `${shown}°` : `${shown} ${unit}`;
}

function isNameField(path: readonly PropertyKey[] | undefined): boolean {
  const last = path?.[path.length - 1];
  return typeof last === 'string' && /name$/i.test(last);
}

function tooSmall(issue: Extract<Issue, { code: 'too_small' }>): string {
  const { minimum, inclusive, origin } = issue;
  if (origin === 'string') {
    if (Number(minimum) <= 1) return isNameField(issue.path) ? 'Give it a name.' : 'Fill this in.';
    return `Use at least ${minimum} characters.`;
  }
  if (origin === 'array' || origin === 'set') return `Add at least ${minimum}.`;
  if (origin === 'number' || origin === 'int' || origin === 'bigint') {
    const value = withUnit(minimum, unitOfField(issue.path));
    return inclusive ? `Enter ${value} or more.` : `Enter more than ${value}.`;
  }
  return 'This is too early or too small.';
}

function tooBig(issue: Extract<Issue, { code: 'too_big' }>): string {
  const { maximum, inclusive, origin } = issue;
  if (origin === 'string') return `At most ${maximum} characters.`;
  if (origin === 'array' || origin === 'set') return `At most ${maximum} in the list.`;
  if (origin === 'number' || origin === 'int' || origin === 'bigint') {
    const value = withUnit(maximum, unitOfField(issue.path));
    return inclusive ? `Enter at most ${value}.` : `Enter less than ${value}.`;
  }
  if (origin === 'file') return 'The file is too large.';
  return 'This is too late or too large.';
}

function invalidType(issue: Extract<Issue, { code: 'invalid_type' }>): string {
  const missing = issue.input === undefined || issue.input === null;
  switch (issue.expected) {
    case 'number':
      return missing ? 'Enter a number.' : 'Enter a number, using digits.';
    case 'int':
      return 'Enter a whole number.';
    case 'string':
      return missing ? (isNameField(issue.path) ? 'Give it a name.' : 'Fill this in.') : 'Enter text here.';
    case 'boolean':
      return 'Choose yes or no.';
    case 'array':
      return missing ? 'This list is needed.' : 'Give a list here.';
    default:
      return missing ? 'This is needed.' : 'This value has the wrong form.';
  }
}

function invalidFormat(issue: Extract<Issue, { code: 'invalid_format' }>): string {
  switch (issue.format) {
    case 'email':
      return 'Enter an e-mail address such as name@example.com.';
    case 'url':
      return 'Enter a web address such as https://example.com.';
    case 'uuid':
    case 'guid':
    case 'cuid':
    case 'cuid2':
    case 'nanoid':
      return 'This is not a valid id.';
    case 'datetime':
    case 'date':
    case 'time':
      return 'Enter a real date and time.';
    default:
      return 'This is not in the expected form.';
  }
}

/** The plain sentence for one validation issue; zod's own wording is never returned. */
export function plainMessage(issue: Issue): string {
  switch (issue.code) {
    case 'too_small':
      return tooSmall(issue);
    case 'too_big':
      return tooBig(issue);
    case 'invalid_type':
      return invalidType(issue);
    case 'invalid_format':
      return invalidFormat(issue);
    case 'invalid_value':
      return issue.values.length === 1 ? 'This value is not allowed here.' : 'Choose one of the options.';
    case 'not_multiple_of':
      return `Use steps of ${issue.divisor}${unitOfField(issue.path) ? ` ${unitOfField(issue.path)}` : ''}.`;
    case 'unrecognized_keys':
      return `Leave out ${issue.keys.length === 1 ? 'the field' : 'the fields'} ${issue.keys.join(', ')}.`;
    case 'invalid_union':
      return 'This does not match any of the allowed forms.';
    case 'invalid_key':
    case 'invalid_element':
      return 'Something in this list is not valid.';
    default:
      return 'This value is not valid.';
  }
}

z.config({ customError: plainMessage });
