import { checkInFieldsSchema, type CheckInRecord } from '@/shared/schemas/check-in';
import type { CheckInSave } from '@/stores/queries/check-ins';

/** Readings kept on the device show with this id prefix: they cannot be changed until the server has them. */
export const KEPT_ID_PREFIX = 'kept-';

export const isKept = (record: CheckInRecord) => record.id.startsWith(KEPT_ID_PREFIX);

/**
 * The trip's check-ins as the server last sent them, with the readings still waiting to sync laid over them (a new
 * one added, a change replacing its reading), in time order: the forecast starts from tonight's reading even with no
 * signal.
 */
export function withKeptCheckIns(
  records: readonly CheckInRecord[],
  kept: readonly CheckInSave[],
  tripId: string,
  authorName: string,
): CheckInRecord[] {
  const merged = [...records];
  kept.forEach((save, i) => {
    if (save.tripId !== tripId) return;
    const parsed = checkInFieldsSchema.safeParse(save.checkIn);
    if (!parsed.success) return;
    const index = save.checkInId ? merged.findIndex((r) => r.id === save.checkInId) : -1;
    const existing = merged[index];
    if (existing) {
      merged[index] = { ...existing, checkIn: { ...parsed.data, at: parsed.data.at ?? existing.checkIn.at } };
    } else if (!save.checkInId && parsed.data.at) {
      merged.push({
        id: `${KEPT_ID_PREFIX}${i}`,
        version: 0,
        authorId: null,
        authorName,
        createdAt: parsed.data.at,
        checkIn: { ...parsed.data, at: parsed.data.at },
      });
    }
  });
  return merged.sort((a, b) => Date.parse(a.checkIn.at) - Date.parse(b.checkIn.at));
}
