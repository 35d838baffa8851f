// What a drive knows about the road besides its hours: how far it is, where that figure came from, and the
// speed its suggested time assumes. The engine reads only hours on the road; these fields feed the suggestion.
import { z } from 'zod';
import { ROAD_FACTOR_RANGE, SPEED_RANGE_KMH } from '../geo/drive-estimate';

export const distanceSourceSchema = z.enum(['great-circle', 'track', 'typed']);
export type DistanceSource = z.infer<typeof distanceSourceSchema>;

export const hoursSourceSchema = z.enum(['suggested', 'typed']);
export type HoursSource = z.infer<typeof hoursSourceSchema>;

/** Optional, so engine inputs written before distances existed stay valid as they are. */
export const drivePlanShape = {
  /** Road distance, km; null until the server has worked it out. */
  distanceKm: z.number().min(0).max(5000).nullable().optional(),
  /** great-circle: from the stops × the road factor; track: a GPX track's length; typed: entered by hand. */
  distanceSource: distanceSourceSchema.optional(),
  roadFactor: z.number().min(ROAD_FACTOR_RANGE.min).max(ROAD_FACTOR_RANGE.max).optional(),
  averageSpeedKmh: z.number().min(SPEED_RANGE_KMH.min).max(SPEED_RANGE_KMH.max).optional(),
  /** suggested: hours follow the distance and speed; typed: someone set them and they stay. */
  hoursSource: hoursSourceSchema.optional(),
};
