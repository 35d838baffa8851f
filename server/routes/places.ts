import { Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import tzlookup from 'tz-lookup';
import { parseCoordinates } from '@/shared/geo/parse-coordinates';
import {
  basemapQuerySchema,
  nearbyPlacesQuerySchema,
  placeSearchQuerySchema,
  type NearbyPlacesResponse,
  type PlaceSearchResponse,
} from '@/shared/schemas/places';
import { HttpError } from '../errors';
import { currentUser } from '../middleware/require-session';
import { basemapFor } from '../places/basemap';
import { nearestPlaces, searchPlaces } from '../places/gazetteer';

/** Typing sends a search every few hundred milliseconds; this leaves room for that and stops a script. */
const SEARCHES_PER_MINUTE = 240;

function zoneAt(lat: number, lon: number): string | null {
  try {
    return tzlookup(lat, lon);
  } catch {
    return null;
  }
}

/**
 * GET /api/places?q= (names or coordinates), GET /api/places/near?lat=&lon= and the map's background,
 * GET /api/places/basemap?west=&south=&east=&north= — behind requireSession, one rate limit for all three.
 */
export function placesRouter(options: { perMinute?: number } = {}): Router {
  const router = Router();
  router.use(
    rateLimit({
      windowMs: 60_000,
      limit: options.perMinute ?? SEARCHES_PER_MINUTE,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      keyGenerator: (_req, res) => currentUser(res).id,
      handler: (_req, _res, next) =>
        next(new HttpError(429, 'rate_limited', 'Too many place searches at once. Wait a moment and try again.')),
    }),
  );

  router.get('/', (req, res) => {
    const { q, limit } = placeSearchQuerySchema.parse(req.query);
    const point = parseCoordinates(q);
    const body: PlaceSearchResponse = point
      ? {
          query: { kind: 'coordinates', lat: point.lat, lon: point.lon, timeZone: zoneAt(point.lat, point.lon) },
          places: nearestPlaces(point, Math.min(limit, 5)),
        }
      : { query: { kind: 'name' }, places: searchPlaces(q, limit) };
    res.setHeader('Cache-Control', 'private, max-age=300');
    res.json(body);
  });

  router.get('/near', (req, res) => {
    const { lat, lon, limit } = nearbyPlacesQuerySchema.parse(req.query);
    const body: NearbyPlacesResponse = { places: nearestPlaces({ lat, lon }, limit) };
    res.setHeader('Cache-Control', 'private, max-age=300');
    res.json(body);
  });

  router.get('/basemap', (req, res) => {
    const box = basemapQuerySchema.parse(req.query);
    // The land does not move: a browser may keep an extent's map for a day.
    res.setHeader('Cache-Control', 'private, max-age=86400');
    res.json(basemapFor(box));
  });

  return router;
}
