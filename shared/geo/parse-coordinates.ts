// Coordinates as people type or paste them: decimal degrees ("57.12, -5.34"), with hemisphere letters
// before or after ("57.12N 5.34W", "N 57.12 W 5.34"), or degrees, minutes and seconds ("57°07'N 5°20'W",
// "57° 7.2' N, 5° 20.4' W", "57°07'12\"N 5°20'24\"W"). Without letters the first number is the latitude.
import type { LatLon } from './great-circle';

// Degrees, then optional minutes (') and seconds ("); minutes and seconds need their marks.
const DMS = String.raw`([+-]?\d{1,3}(?:\.\d+)?)\s*(?:°|DEG\b)?\s*(?:(\d{1,2}(?:\.\d+)?)\s*'\s*)?(?:(\d{1,2}(?:\.\d+)?)\s*"\s*)?`;
const LEADING = new RegExp(String.raw`^([NSEW])\s*${DMS}\s*[,;]?\s*([NSEW])\s*${DMS}$`);
const TRAILING = new RegExp(String.raw`^${DMS}\s*([NSEW])\s*[,;]?\s*${DMS}\s*([NSEW])$`);
// No letters: a comma, a semicolon or a space must separate the two, or "12" would read as 1, 2.
const PLAIN = new RegExp(String.raw`^${DMS}(?:\s*[,;]\s*|\s+)${DMS}$`);

type Part = { degrees: string; minutes?: string; seconds?: string; hemisphere?: string };

function normalise(text: string): string {
  return text
    .trim()
    .toUpperCase()
    .replace(/[−–]/g, '-')
    .replace(/[º˚]/g, '°')
    .replace(/''|[″”“]/g, '"')
    .replace(/[′’‘`]/g, "'");
}

/** A part's value in decimal degrees (unsigned unless typed with a sign), or null when it cannot be one. */
function valueOf(part: Part): number | null {
  const degrees = Number(part.degrees);
  const minutes = part.minutes === undefined ? 0 : Number(part.minutes);
  const seconds = part.seconds === undefined ? 0 : Number(part.seconds);
  const withMinutes = part.minutes !== undefined || part.seconds !== undefined;
  // 57.5°07' makes no sense, nor does 7.5'12": only the last unit given may carry a fraction.
  if (withMinutes && !Number.isInteger(degrees)) return null;
  if (part.seconds !== undefined && !Number.isInteger(minutes)) return null;
  if (minutes >= 60 || seconds >= 60) return null;
  if (part.hemisphere && /^[+-]/.test(part.degrees)) return null;
  const magnitude = Math.abs(degrees) + minutes / 60 + seconds / 3600;
  const negative = part.degrees.startsWith('-') || part.hemisphere === 'S' || part.hemisphere === 'W';
  return negative ? -magnitude : magnitude;
}

function toLatLon(first: Part, second: Part): LatLon | null {
  const a = valueOf(first);
  const b = valueOf(second);
  if (a === null || b === null) return null;
  const isLat = (p: Part) => p.hemisphere === 'N' || p.hemisphere === 'S';
  let lat = a;
  let lon = b;
  if (first.hemisphere && second.hemisphere) {
    if (isLat(first) === isLat(second)) return null;
    if (!isLat(first)) [lat, lon] = [b, a];
  }
  if (Math.abs(lat) > 90 || Math.abs(lon) > 180) return null;
  return { lat, lon };
}

/** Reads a typed or pasted coordinate pair; null when the text is not one (a place name, say). */
export function parseCoordinates(text: string): LatLon | null {
  const input = normalise(text);
  if (input.length === 0 || input.length > 80) return null;
  const leading = LEADING.exec(input);
  if (leading) {
    const [, h1 = '', d1 = '', m1, s1, h2 = '', d2 = '', m2, s2] = leading;
    return toLatLon(
      { hemisphere: h1, degrees: d1, minutes: m1, seconds: s1 },
      { hemisphere: h2, degrees: d2, minutes: m2, seconds: s2 },
    );
  }
  const trailing = TRAILING.exec(input);
  if (trailing) {
    const [, d1 = '', m1, s1, h1 = '', d2 = '', m2, s2, h2 = ''] = trailing;
    return toLatLon(
      { hemisphere: h1, degrees: d1, minutes: m1, seconds: s1 },
      { hemisphere: h2, degrees: d2, minutes: m2, seconds: s2 },
    );
  }
  const plain = PLAIN.exec(input);
  if (plain) {
    const [, d1 = '', m1, s1, d2 = '', m2, s2] = plain;
    return toLatLon({ degrees: d1, minutes: m1, seconds: s1 }, { degrees: d2, minutes: m2, seconds: s2 });
  }
  return null;
}

/** "57.12000, -5.34000": five decimals are about a metre, finer than any pitch needs. */
export function formatDecimal({ lat, lon }: LatLon): string {
  return `${lat.toFixed(5)}, ${lon.toFixed(5)}`;
}

function dms(value: number, positive: string, negative: string): string {
  const totalSeconds = Math.round(Math.abs(value) * 3600);
  const degrees = Math.floor(totalSeconds / 3600);
  const minutes = Math.floor((totalSeconds % 3600) / 60);
  const seconds = totalSeconds % 60;
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${degrees}°${pad(minutes)}′${pad(seconds)}″${value < 0 ? negative : positive}`;
}

/** "57°07′12″N 5°20′24″W", as printed on paper maps. */
export function formatDms({ lat, lon }: LatLon): string {
  return `${dms(lat, 'N', 'S')} ${dms(lon, 'E', 'W')}`;
}
