// GPX import: what the preview shows before anything is saved, and what the import call confirms.
import { z } from 'zod';
import { versionSchema } from './api';
import { driveSchema, stopSchema } from './trip';

export const gpxPreviewSchema = z.object({
  /** The file's own name for the trip, when it has one. */
  name: z.string().nullable(),
  /** from-file: arrivals are the waypoints' times; spread: the stops share the trip's nights. */
  timing: z.enum(['from-file', 'spread']),
  lineKind: z.enum(['track', 'route']).nullable(),
  /** Length of the whole track or route, km. */
  lineKm: z.number().nullable(),
  stops: z.array(z.object({ stop: stopSchema, notes: z.string() })),
  drives: z.array(driveSchema),
  /** How many stops now on the route the import would replace. */
  replaces: z.number().int().min(0),
  warnings: z.array(z.string()),
});
export type GpxPreview = z.infer<typeof gpxPreviewSchema>;

export const gpxImportQuerySchema = z
  .object({
    tripVersion: z.coerce.number().pipe(versionSchema),
    /** Must be "true" when the route already has stops: they are replaced by the file's. */
    replace: z.enum(['true', 'false']).default('false'),
  })
  .strict();
