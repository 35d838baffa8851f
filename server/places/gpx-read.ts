// Reads a GPX file (parsed with @xmldom/xmldom, turned into GeoJSON by @tmcw/togeojson) into what an import
// needs: the waypoints in file order and the tracks (or, without tracks, the routes) as one line of points.
// Everything a person could get wrong is refused with a message that says what to do.
import { gpx } from '@tmcw/togeojson';
import { DOMParser, onErrorStopParsing } from '@xmldom/xmldom';
import type { Feature, Position } from 'geojson';

/** A week's recorded track at one point every few seconds stays well under this; a whole year's log does not. */
export const GPX_MAX_BYTES = 5 * 1024 * 1024;
export const GPX_MAX_TRACK_POINTS = 200_000;
/** A trip holds at most 60 stops (shared/schemas/trip.ts). */
export const GPX_MAX_WAYPOINTS = 60;

export type GpxWaypoint = {
  name: string | null;
  lat: number;
  lon: number;
  elevationM: number | null;
  time: string | null;
};
export type GpxPoint = { lat: number; lon: number; time: number | null };
export type GpxFile = {
  name: string | null;
  waypoints: GpxWaypoint[];
  line: GpxPoint[];
  lineKind: 'track' | 'route' | null;
};

/** Something about the file itself that its owner can fix; the route answers it as a 422 about the file. */
export class GpxError extends Error {
  override name = 'GpxError';
}
const refuse = (message: string) => new GpxError(message);

function validTime(value: unknown): string | null {
  return typeof value === 'string' && Number.isFinite(Date.parse(value)) ? new Date(value).toISOString() : null;
}

function inRange([lon, lat]: Position): boolean {
  return (
    typeof lat === 'number' &&
    typeof lon === 'number' &&
    Math.abs(lat) <= 90 &&
    Math.abs(lon) <= 180 &&
    Number.isFinite(lat) &&
    Number.isFinite(lon)
  );
}

/** The lines of one feature with their times, whichever of LineString or MultiLineString togeojson made. */
function linesOf(feature: Feature): GpxPoint[][] {
  const times = (feature.properties?.coordinateProperties as { times?: unknown } | undefined)?.times;
  const geometry = feature.geometry;
  const lines =
    geometry?.type === 'LineString'
      ? [geometry.coordinates]
      : geometry?.type === 'MultiLineString'
        ? geometry.coordinates
        : [];
  return lines.map((line, l) => {
    const lineTimes = Array.isArray(times) ? (Array.isArray(times[0]) ? times[l] : times) : undefined;
    return line.filter(inRange).map((position, i) => {
      const time = Array.isArray(lineTimes) ? validTime(lineTimes[i]) : null;
      return { lon: position[0] ?? 0, lat: position[1] ?? 0, time: time ? Date.parse(time) : null };
    });
  });
}

export function readGpx(text: string): GpxFile {
  if (text.trim().length === 0) throw refuse('That file is empty. Choose the .gpx file your navigation app exported.');
  // GPX needs no document type; one with entity declarations is how XML bombs are built.
  if (/<!DOCTYPE|<!ENTITY/i.test(text))
    throw refuse('That file declares a document type, which GPX files never need. Export it again as plain GPX 1.1.');
  // Counted in the text before parsing: building a DOM for a huge log is what takes the time.
  const pointCount = (text.match(/<(?:\w+:)?(?:trkpt|rtept)\b/g) ?? []).length;
  if (pointCount > GPX_MAX_TRACK_POINTS)
    throw refuse(
      `That file holds ${pointCount.toLocaleString('en')} track points; at most ${GPX_MAX_TRACK_POINTS.toLocaleString('en')} can be read. Export only this trip's track, or a simplified one.`,
    );
  let document;
  try {
    document = new DOMParser({ onError: onErrorStopParsing }).parseFromString(text, 'application/xml');
  } catch (error) {
    const detail = error instanceof Error ? error.message.split('\n')[0] : '';
    throw refuse(`That file is not readable XML${detail ? ` (${detail})` : ''}. Check it is the .gpx file itself.`);
  }
  const root = document.documentElement;
  if (!root || root.localName !== 'gpx')
    throw refuse(
      `That file is XML but not GPX (its first element is <${root?.localName ?? '?'}>). Choose a .gpx file.`,
    );
  const features = gpx(document).features;
  const waypoints: GpxWaypoint[] = features
    .filter((f) => f.geometry?.type === 'Point')
    .flatMap((f) => {
      const position = f.geometry?.type === 'Point' ? f.geometry.coordinates : [];
      if (!inRange(position)) return [];
      const name = typeof f.properties?.name === 'string' ? f.properties.name : null;
      const elevation = position[2];
      return [
        {
          name,
          lon: position[0] ?? 0,
          lat: position[1] ?? 0,
          elevationM: typeof elevation === 'number' && Number.isFinite(elevation) ? elevation : null,
          time: validTime(f.properties?.time),
        },
      ];
    });
  if (waypoints.length === 0)
    throw refuse(
      'That file has no waypoints. Mark each place you will stay as a waypoint in your navigation app and export again.',
    );
  if (waypoints.length > GPX_MAX_WAYPOINTS)
    throw refuse(
      `That file has ${waypoints.length} waypoints; a trip holds at most ${GPX_MAX_WAYPOINTS} stops. Keep only the places you will stay.`,
    );

  const lineFeatures = (kind: 'trk' | 'rte') => features.filter((f) => f.properties?._gpxType === kind);
  const tracks = lineFeatures('trk');
  const used = tracks.length > 0 ? tracks : lineFeatures('rte');
  const metadataName = document.getElementsByTagName('metadata')[0]?.getElementsByTagName('name')[0]?.textContent;
  return {
    name: metadataName?.trim() || null,
    waypoints,
    line: used.flatMap(linesOf).flat(),
    lineKind: used.length === 0 ? null : tracks.length > 0 ? 'track' : 'route',
  };
}
