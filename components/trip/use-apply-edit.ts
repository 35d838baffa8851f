import { useState } from 'react';
import type { FixEdit } from '@/components/budget/apply-fix';
import type { TripDetail, UndoFixRequest } from '@/shared/schemas/api';
import { ApiError } from '@/stores/queries/api-client';
import { useScheduleSaveMutation } from '@/stores/queries/appliances';
import { useStopSaveMutation } from '@/stores/queries/route';
import { useTripRigSaveMutation } from '@/stores/queries/rigs';
import { useUndoFixMutation } from '@/stores/queries/trips';
import { showToast } from '@/stores/toast-store';

function failureMessage(error: unknown, what: string): string {
  if (error instanceof ApiError && error.status === 409)
    return 'Someone else changed this trip since you opened it. The screen now shows their version; check it and try again.';
  return error instanceof ApiError ? error.message : `That ${what} could not be saved.`;
}

/** The request that puts a record back as it stood before an edit, once the edit's new version is known. */
export function undoFor(edit: FixEdit, detail: TripDetail, newVersion: number): UndoFixRequest {
  if (edit.kind === 'rig')
    return { kind: 'rig', version: newVersion, restore: { version: detail.rig.version, rig: detail.rig.rig } };
  if (edit.kind === 'stop')
    return {
      kind: 'stop',
      stopId: edit.record.id,
      version: newVersion,
      restore: { version: edit.record.version, stop: edit.record.stop, notes: edit.record.notes },
    };
  return {
    kind: 'appliance',
    applianceId: edit.record.id,
    version: newVersion,
    restore: { version: edit.record.version, schedule: edit.record.appliance.schedule },
  };
}

/**
 * Sends a one-click edit (a flag's fix, a kept what-if) and reports the outcome in a toast. A single edit (a fix)
 * is offered an Undo that puts the record back as it was, its version included.
 */
export function useApplyEdit(detail: TripDetail) {
  const tripId = detail.trip.id;
  const rigSave = useTripRigSaveMutation(tripId);
  const stopSave = useStopSaveMutation(tripId);
  const scheduleSave = useScheduleSaveMutation();
  const undoFix = useUndoFixMutation(tripId);
  const [busy, setBusy] = useState<string | null>(null);

  const save = async (edit: FixEdit, rigVersion: number): Promise<number> => {
    if (edit.kind === 'rig') return (await rigSave.mutateAsync({ version: rigVersion, rig: edit.rig })).version;
    if (edit.kind === 'appliance')
      return (
        await scheduleSave.mutateAsync({
          tripId,
          applianceId: edit.record.id,
          version: edit.record.version,
          schedule: edit.schedule,
        })
      ).version;
    return (
      await stopSave.mutateAsync({
        stopId: edit.record.id,
        version: edit.record.version,
        stop: edit.stop,
        notes: edit.record.notes,
      })
    ).version;
  };

  const undo = async (request: UndoFixRequest, summary: string): Promise<void> => {
    try {
      await undoFix.mutateAsync(request);
      showToast(`Undone: ${summary}`);
    } catch (error) {
      showToast(failureMessage(error, 'undo'), { tone: 'danger' });
    }
  };

  const apply = async (key: string, edits: FixEdit[], rigVersion: number): Promise<boolean> => {
    setBusy(key);
    try {
      const versions: number[] = [];
      for (const edit of edits) versions.push(await save(edit, rigVersion));
      const summary = edits.map((e) => e.summary).join(', ');
      const only = edits.length === 1 ? edits[0] : undefined;
      const request = only ? undoFor(only, detail, versions[0] ?? 0) : null;
      showToast(
        `Saved: ${summary}`,
        request ? { action: { label: 'Undo', run: () => void undo(request, summary) } } : {},
      );
      return true;
    } catch (error) {
      showToast(failureMessage(error, 'change'), { tone: 'danger' });
      return false;
    } finally {
      setBusy(null);
    }
  };
  return { apply, busy };
}
