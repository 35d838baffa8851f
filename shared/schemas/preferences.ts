import { z } from 'zod';

export const unitSystemSchema = z.enum(['metric', 'us']);

/** A person's display preferences; the API answers GET /api/me/preferences with this. */
export const preferencesSchema = z.object({ units: unitSystemSchema });
export type Preferences = z.infer<typeof preferencesSchema>;

/** Used before anything is stored or fetched: the engine works in metric, so nothing is converted. */
export const DEFAULT_PREFERENCES: Preferences = { units: 'metric' };
