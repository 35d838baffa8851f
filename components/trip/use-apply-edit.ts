import { useState } from 'react';
import type { FixEdit } from '@/components/budget/apply-fix';
import { ApiError } from '@/stores/queries/api-client';
import { useScheduleSaveMutation } from '@/stores/queries/appliances';
import { useStopSaveMutation } from '@/stores/queries/route';
import { useTripRigSaveMutation } from '@/stores/queries/rigs';
import { showToast } from '@/stores/toast-store';

/** Sends a one-click edit (a flag's fix, a kept what-if) and reports the outcome in a toast. */
export function useApplyEdit(tripId: string) {
  const rigSave = useTripRigSaveMutation(tripId);
  const stopSave = useStopSaveMutation(tripId);
  const scheduleSave = useScheduleSaveMutation(tripId);
  const [busy, setBusy] = useState<string | null>(null);

  const apply = async (key: string, edits: FixEdit[], rigVersion: number): Promise<boolean> => {
    setBusy(key);
    try {
      for (const edit of edits) {
        if (edit.kind === 'rig') await rigSave.mutateAsync({ version: rigVersion, rig: edit.rig });
        else if (edit.kind === 'appliance')
          await scheduleSave.mutateAsync({
            applianceId: edit.record.id,
            version: edit.record.version,
            schedule: edit.schedule,
          });
        else
          await stopSave.mutateAsync({
            stopId: edit.record.id,
            version: edit.record.version,
            stop: edit.stop,
            notes: edit.record.notes,
          });
      }
      showToast(`Saved: ${edits.map((e) => e.summary).join(', ')}`);
      return true;
    } catch (error) {
      const message =
        error instanceof ApiError && error.status === 409
          ? 'Someone else changed this trip since you opened it. The screen now shows their version; check it and try again.'
          : error instanceof ApiError
            ? error.message
            : 'That change could not be saved.';
      showToast(message, { tone: 'danger' });
      return false;
    } finally {
      setBusy(null);
    }
  };
  return { apply, busy };
}
