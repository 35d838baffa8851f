import { eq } from 'drizzle-orm';
import { Router } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { preferences } from '@/db/schema/preferences';
import { currentUser } from '../middleware/require-session';

export const preferencesSchema = z.object({ units: z.enum(['metric', 'us']) }).strict();

export function preferencesRouter({ db }: { db: Db }): Router {
  const router = Router();

  router.get('/', (_req, res) => {
    const row = db
      .select()
      .from(preferences)
      .where(eq(preferences.userId, currentUser(res).id))
      .get();
    res.json({ units: row?.units ?? 'metric' });
  });

  router.put('/', (req, res) => {
    const userId = currentUser(res).id;
    const { units } = preferencesSchema.parse(req.body);
    db.insert(preferences)
      .values({ userId, units })
      .onConflictDoUpdate({ target: preferences.userId, set: { units } })
      .run();
    res.json({ units });
  });

  return router;
}
