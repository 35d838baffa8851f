import { sql } from 'drizzle-orm';
import { Router } from 'express';
import type { AppDeps } from '../app';

export function healthRouter({ db, version }: Pick<AppDeps, 'db'> & { version: string }): Router {
  const router = Router();
  router.get('/', (_req, res) => {
    let database: 'ok' | 'unavailable' = 'ok';
    try {
      db.get(sql`select 1`);
    } catch {
      database = 'unavailable';
    }
    res
      .status(database === 'ok' ? 200 : 503)
      .json({ status: database === 'ok' ? 'ok' : 'degraded', version, database });
  });
  return router;
}
