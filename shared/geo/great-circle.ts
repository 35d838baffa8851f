// Great-circle distance on a sphere by the haversine formula, with the IUGG mean Earth radius
// (6,371.0088 km, the mean radius of the WGS-84 ellipsoid; Moritz 2000, Geodetic Reference System 1980).
// On the sphere the error against the ellipsoid stays under about 0.5 %, far below a road factor's spread.

export const EARTH_MEAN_RADIUS_KM = 6371.0088;

export type LatLon = { lat: number; lon: number };

const RAD = Math.PI / 180;

/** Distance between two points along the Earth's surface, km. */
export function greatCircleKm(a: LatLon, b: LatLon): number {
  const dLat = (b.lat - a.lat) * RAD;
  const dLon = (b.lon - a.lon) * RAD;
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(a.lat * RAD) * Math.cos(b.lat * RAD) * Math.sin(dLon / 2) ** 2;
  // min() guards the rounding that can push h a hair past 1 for antipodal points.
  return 2 * EARTH_MEAN_RADIUS_KM * Math.asin(Math.min(1, Math.sqrt(h)));
}

/** Length of a polyline (a GPX track, a drawn route), km. */
export function pathLengthKm(points: readonly LatLon[]): number {
  let total = 0;
  for (let i = 1; i < points.length; i += 1) {
    const previous = points[i - 1];
    const point = points[i];
    if (previous && point) total += greatCircleKm(previous, point);
  }
  return total;
}
