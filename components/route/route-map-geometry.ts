// The route map's geometry, kept apart from drawing so it can be tested: a Mercator projection (d3-geo) fitted to
// the stops, the basemap extent that covers what is on screen, and SVG paths for land, borders and drives.
import { geoMercator, type GeoProjection } from 'd3-geo';
import type { LatLon } from '@/shared/geo/great-circle';
import type { Basemap, BasemapQuery } from '@/shared/schemas/places';

/** Around a single stop, or stops close together, the map still shows this many degrees each way. */
const MIN_HALF_SPAN_DEG = 0.3;
/** The basemap is asked for on a coarse grid, so nearby extents share one answer. */
const GRID_DEG = 0.5;

export type MapSize = { width: number; height: number; padding: number };

/** A Mercator projection that fits every stop inside the box, with room around them. */
export function fitProjection(stops: readonly LatLon[], size: MapSize): GeoProjection | null {
  if (stops.length === 0 || size.width <= 2 * size.padding || size.height <= 2 * size.padding) return null;
  const lats = stops.map((s) => s.lat);
  const lons = stops.map((s) => s.lon);
  const midLat = (Math.min(...lats) + Math.max(...lats)) / 2;
  const midLon = (Math.min(...lons) + Math.max(...lons)) / 2;
  const halfLat = Math.max(MIN_HALF_SPAN_DEG, (Math.max(...lats) - Math.min(...lats)) / 2);
  const halfLon = Math.max(MIN_HALF_SPAN_DEG, (Math.max(...lons) - Math.min(...lons)) / 2);
  const corners = [
    [midLon - halfLon, midLat - halfLat],
    [midLon + halfLon, midLat + halfLat],
  ];
  return geoMercator().fitExtent(
    [
      [size.padding, size.padding],
      [size.width - size.padding, size.height - size.padding],
    ],
    { type: 'MultiPoint', coordinates: corners },
  );
}

/** The lon/lat box the screen shows, widened to the basemap grid; null when the map has no size yet. */
export function visibleExtent(projection: GeoProjection, size: MapSize): BasemapQuery | null {
  const topLeft = projection.invert?.([0, 0]);
  const bottomRight = projection.invert?.([size.width, size.height]);
  if (!topLeft || !bottomRight) return null;
  const down = (v: number) => Math.floor(v / GRID_DEG) * GRID_DEG;
  const up = (v: number) => Math.ceil(v / GRID_DEG) * GRID_DEG;
  const clamp = (v: number, limit: number) => Math.max(-limit, Math.min(limit, v));
  return {
    west: clamp(down(topLeft[0]), 180),
    east: clamp(up(bottomRight[0]), 180),
    south: clamp(down(bottomRight[1]), 85),
    north: clamp(up(topLeft[1]), 85),
  };
}

const fixed = (v: number) => Math.round(v * 10) / 10;

function pathOf(points: readonly (readonly [number, number])[], projection: GeoProjection, close: boolean): string {
  let d = '';
  points.forEach(([lon, lat], i) => {
    const p = projection([lon, lat]);
    if (p) d += `${i === 0 ? 'M' : 'L'}${fixed(p[0])},${fixed(p[1])}`;
  });
  return d && close ? `${d}Z` : d;
}

/** Land as one even-odd path (holes such as lakes stay open) and borders as another. */
export function basemapPaths(basemap: Basemap, projection: GeoProjection): { land: string; borders: string } {
  return {
    land: basemap.land.map((ring) => pathOf(ring, projection, true)).join(''),
    borders: basemap.borders.map((line) => pathOf(line, projection, false)).join(''),
  };
}

/** Each stop's position on screen, in route order. */
export function projectStops(stops: readonly LatLon[], projection: GeoProjection): { x: number; y: number }[] {
  return stops.map((s) => {
    const p = projection([s.lon, s.lat]);
    return { x: p?.[0] ?? 0, y: p?.[1] ?? 0 };
  });
}

/** The drives as straight legs from each stop to the next. */
export function drivePath(points: readonly { x: number; y: number }[]): string {
  return points.map((p, i) => `${i === 0 ? 'M' : 'L'}${fixed(p.x)},${fixed(p.y)}`).join('');
}

/** A point on screen back to latitude and longitude, rounded to 5 decimals (about a metre). */
export function pointToLatLon(projection: GeoProjection, x: number, y: number): LatLon | null {
  const lonLat = projection.invert?.([x, y]);
  if (!lonLat) return null;
  const [lon, lat] = lonLat;
  if (!Number.isFinite(lat) || !Number.isFinite(lon) || Math.abs(lat) > 90 || Math.abs(lon) > 180) return null;
  return { lat: Math.round(lat * 1e5) / 1e5, lon: Math.round(lon * 1e5) / 1e5 };
}

/** A round length for the scale bar that fits in `maxPx`: 1, 2 or 5 × a power of ten, in km. */
export function scaleBar(projection: GeoProjection, size: MapSize, maxPx: number): { km: number; px: number } | null {
  const y = size.height / 2;
  const a = projection.invert?.([size.width / 2 - 50, y]);
  const b = projection.invert?.([size.width / 2 + 50, y]);
  if (!a || !b) return null;
  const rad = Math.PI / 180;
  const kmPer100Px = Math.abs(b[0] - a[0]) * rad * 6371.0088 * Math.cos(a[1] * rad);
  const maxKm = (kmPer100Px / 100) * maxPx;
  const power = 10 ** Math.floor(Math.log10(maxKm));
  const km = [5, 2, 1].map((m) => m * power).find((v) => v <= maxKm) ?? power;
  return { km, px: (km / kmPer100Px) * 100 };
}
