// Searching the IANA time zones by what a person types: "new york", "new_york" and "America/New" all find
// America/New_York; every word typed must appear, and zones whose place name starts with the search come first.

/** The zones this browser knows, or a short list where the runtime cannot list them. */
export function allZones(): string[] {
  const intl = Intl as typeof Intl & { supportedValuesOf?: (key: 'timeZone') => string[] };
  const zones = typeof intl.supportedValuesOf === 'function' ? intl.supportedValuesOf('timeZone') : [];
  // Some runtimes leave UTC out of the list although it is a valid zone, and it is a common choice for a trip at sea.
  return zones.includes('UTC') ? zones : [...zones, 'UTC'];
}

const words = (s: string) =>
  s
    .toLowerCase()
    .replace(/[_/-]+/g, ' ')
    .split(/\s+/)
    .filter(Boolean);

/** The zone's place, as shown: "America/Argentina/Buenos_Aires" reads "Buenos Aires". */
export function placeOf(zone: string): string {
  return (zone.split('/').pop() ?? zone).replace(/_/g, ' ');
}

export type ZoneMatches = { zones: string[]; more: number };

/** Zones matching the search, best first, at most `limit` of them and how many more matched. */
export function filterZones(zones: readonly string[], query: string, limit = 20): ZoneMatches {
  const wanted = words(query);
  if (wanted.length === 0) return { zones: zones.slice(0, limit), more: Math.max(0, zones.length - limit) };
  const scored: { zone: string; rank: number }[] = [];
  for (const zone of zones) {
    const haystack = words(zone).join(' ');
    if (!wanted.every((w) => haystack.includes(w))) continue;
    const place = words(placeOf(zone)).join(' ');
    const phrase = wanted.join(' ');
    // 0: the place starts with the search; 1: a word of the zone does; 2: it only appears inside a word.
    const rank = place.startsWith(phrase) ? 0 : words(zone).some((w) => w.startsWith(wanted[0] ?? '')) ? 1 : 2;
    scored.push({ zone, rank });
  }
  scored.sort((a, b) => a.rank - b.rank || a.zone.localeCompare(b.zone));
  return { zones: scored.slice(0, limit).map((s) => s.zone), more: Math.max(0, scored.length - limit) };
}
