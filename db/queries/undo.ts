// Undo of an applied fix: after the record's content is written back, its version goes back to what it was, so the
// record is exactly as it stood before the fix (a client still holding that version is up to date again).
import { eq } from 'drizzle-orm';
import type { DbExecutor } from '../client';
import { appliances, rigs, stops } from '../schema';

export function setRecordVersion(db: DbExecutor, table: 'rig' | 'stop' | 'appliance', id: string, version: number) {
  if (table === 'rig') db.update(rigs).set({ version }).where(eq(rigs.id, id)).run();
  else if (table === 'stop') db.update(stops).set({ version }).where(eq(stops.id, id)).run();
  else db.update(appliances).set({ version }).where(eq(appliances.id, id)).run();
}
