// Synthetic hourly weather for the local weather fake. It is NOT a climate record: it is a deterministic stand-in
// with plausible shapes, so development and tests exercise the whole path (fetch, cache, engine) without the network.
//
// The model, per place (rounded to 0.1°) and UTC calendar day:
// - Daily clearness K (the day's GHI over the engine's clear-sky GHI) is drawn from a Beta distribution with mean
//   meanClearness(lat, day) and concentration clearnessConcentration(lat, day), both smooth in latitude and season:
//   clearest near 27° (the subtropical high-pressure belts), cloudier at the equator and towards the poles,
//   clearer in the local summer away from the tropics, plus a fixed offset per place (its "site seed").
// - Each hour's GHI (the mean of the preceding hour, as the services report it) is K × the Haurwitz clear-sky GHI
//   averaged over four instants inside that hour, so a day's shape follows the sun.
// - Temperature: an annual mean falling with latitude, a seasonal cosine peaking about 20 days after the solstice,
//   a day-to-day shift with the day's clearness, and a daily cosine with its minimum at 03:00 solar time.
// Draws use a seeded Mersenne Twister per place and year, taken day by day from 1 January, so the same place and
// date always get the same value whichever range a request asks for.
import beta from '@stdlib/random-base-beta';
import { haurwitzGhi } from '@/shared/engine/clear-sky';
import { sunPosition } from '@/shared/engine/sun-position';

const YEAR_DAYS = 365.25;
const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;

/** A place on the fake's 0.1° grid and its fixed clearness offset. */
export type SyntheticSite = { lat: number; lon: number; seed: number; clearnessOffset: number };

/** 32-bit FNV-1a of a text: a stable seed for the place's and year's generators. */
function fnv1a(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h >>> 0;
}

export function syntheticSite(lat: number, lon: number): SyntheticSite {
  const latE1 = Math.round(lat * 10);
  const lonE1 = Math.round(lon * 10);
  const seed = fnv1a(`${latE1},${lonE1}`);
  // ±0.04 around the latitude's mean: neighbouring places differ a little, as valleys and coasts do.
  const clearnessOffset = ((seed % 10_001) / 10_000 - 0.5) * 0.08;
  return { lat: latE1 / 10, lon: lonE1 / 10, seed, clearnessOffset };
}

/** +1 at the hemisphere's clearest time of year (mid-July north, mid-January south), −1 half a year later. */
function seasonOf(lat: number, dayOfYear: number): number {
  const peakDay = lat >= 0 ? 196 : 13;
  return Math.cos((2 * Math.PI * (dayOfYear - peakDay)) / YEAR_DAYS);
}

/** The model's mean daily clearness at a latitude and day of year, before the place's offset. */
export function meanClearness(lat: number, dayOfYear: number, clearnessOffset = 0): number {
  const a = Math.abs(lat);
  const base = 0.48 + 0.2 * Math.exp(-(((a - 27) / 14) ** 2)) - 0.06 * Math.exp(-((a / 10) ** 2));
  const seasonal = 0.1 * Math.min(1, a / 40) * seasonOf(lat, dayOfYear);
  return Math.min(0.8, Math.max(0.2, base + seasonal + clearnessOffset));
}

/** Beta concentration α+β: higher (days more alike) in the settled season, lower in the changeable one. */
export function clearnessConcentration(lat: number, dayOfYear: number): number {
  return 6 + 3 * Math.min(1, Math.abs(lat) / 40) * seasonOf(lat, dayOfYear);
}

function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** Every day's clearness of one year at a place, index 0 = 1 January. */
export function yearClearness(site: SyntheticSite, year: number): Float64Array {
  const days = isLeapYear(year) ? 366 : 365;
  // Mersenne Twister seeds must be 1 … 2³²−1.
  const draw = beta.factory({ seed: fnv1a(`${site.seed}:${year}`) || 1 });
  const out = new Float64Array(days);
  for (let d = 0; d < days; d++) {
    const mean = meanClearness(site.lat, d + 1, site.clearnessOffset);
    const k = clearnessConcentration(site.lat, d + 1);
    out[d] = draw(mean * k, (1 - mean) * k);
  }
  return out;
}

/** Annual mean air temperature, °C: warm tropics, cooling beyond 15° of latitude. */
function annualMeanC(lat: number): number {
  return 27 - 0.5 * Math.max(0, Math.abs(lat) - 15);
}

export type SyntheticSeries = { time: string[]; ghi: number[]; tempC: number[] };

/** The fake's hourly series for a place and an inclusive range of UTC dates (YYYY-MM-DD). */
export function syntheticHourly(site: SyntheticSite, startDate: string, endDate: string): SyntheticSeries {
  const startMs = Date.parse(`${startDate}T00:00:00Z`);
  const endMs = Date.parse(`${endDate}T23:00:00Z`);
  const years = new Map<number, Float64Array>();
  const clearnessOn = (utcMs: number): { k: number; dayOfYear: number } => {
    const d = new Date(utcMs);
    const year = d.getUTCFullYear();
    let days = years.get(year);
    if (!days) {
      days = yearClearness(site, year);
      years.set(year, days);
    }
    const dayOfYear = Math.floor((utcMs - Date.UTC(year, 0, 1)) / DAY_MS) + 1;
    return { k: days[dayOfYear - 1] ?? 0.5, dayOfYear };
  };
  const time: string[] = [];
  const ghi: number[] = [];
  const tempC: number[] = [];
  const amplitude = Math.min(20, 0.33 * Math.abs(site.lat));
  const warmestDay = site.lat >= 0 ? 200 : 18;
  for (let t = startMs; t <= endMs; t += HOUR_MS) {
    const { k, dayOfYear } = clearnessOn(t);
    // The reported value is the preceding hour's mean: sample it at four instants inside that hour.
    let clearSky = 0;
    for (let q = 0; q < 4; q++) {
      const at = t - HOUR_MS + ((q + 0.5) * HOUR_MS) / 4;
      clearSky += haurwitzGhi(90 - sunPosition(at, site.lat, site.lon).altitudeDeg) / 4;
    }
    const dayMeanC =
      annualMeanC(site.lat) +
      amplitude * Math.cos((2 * Math.PI * (dayOfYear - warmestDay)) / YEAR_DAYS) +
      5 * (k - meanClearness(site.lat, dayOfYear, site.clearnessOffset));
    const solarHour = (((t / HOUR_MS + site.lon / 15) % 24) + 24) % 24;
    const dailyRangeC = 4 + 10 * k;
    time.push(new Date(t).toISOString().slice(0, 16));
    ghi.push(Math.round(k * clearSky * 10) / 10);
    tempC.push(Math.round((dayMeanC + (dailyRangeC / 2) * Math.cos((2 * Math.PI * (solarHour - 15)) / 24)) * 10) / 10);
  }
  return { time, ghi, tempC };
}
