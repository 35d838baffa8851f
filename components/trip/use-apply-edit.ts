import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { FixEdit } from '@/components/budget/apply-fix';
import type { TripDetail, UndoFixRequest } from '@/shared/schemas/api';
import { ApiError } from '@/stores/queries/api-client';
import { useScheduleSaveMutation } from '@/stores/queries/appliances';
import { useStopSaveMutation } from '@/stores/queries/route';
import { useTripRigSaveMutation } from '@/stores/queries/rigs';
import { invalidateTrip, useUndoFixMutation } from '@/stores/queries/trips';
import { dismissToast, showToast } from '@/stores/toast-store';
import { dropUndo, latestUndo, pushUndo, useUndoStack } from '@/stores/undo-store';

/** What a refused save says in its toast: a 409 explains that the screen now shows the other version. */
export function failureMessage(error: unknown, what: string): string {
  if (error instanceof ApiError && error.status === 409)
    return 'Someone else changed this trip since you opened it. The screen now shows their version; check it and try again.';
  return error instanceof ApiError ? error.message : `That ${what} could not be saved.`;
}

// The toast of the latest fix: one Undo on screen at a time, so an older toast's Undo never takes back a newer fix.
let undoToast: number | null = null;

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
 * Sends a one-click edit (a flag's fix, a kept what-if; an accepted calibration through `offerUndo`) and reports the outcome in a toast. A single edit (a fix)
 * goes on the visit's undo stack: the toast's Undo, and "Undo last fix", put back the latest one, its record as it
 * was, version included, so several fixes come off in reverse order.
 */
export function useApplyEdit(detail: TripDetail) {
  const tripId = detail.trip.id;
  const queryClient = useQueryClient();
  const rigSave = useTripRigSaveMutation(tripId);
  const stopSave = useStopSaveMutation(tripId);
  const scheduleSave = useScheduleSaveMutation();
  const undoFix = useUndoFixMutation(tripId);
  const stack = useUndoStack(tripId);
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

  const undoLast = async (): Promise<void> => {
    const entry = latestUndo(tripId);
    if (!entry) return;
    setBusy('undo');
    try {
      await undoFix.mutateAsync(entry.request);
      dropUndo(tripId, entry.id);
      showToast(`Undone: ${entry.summary}`);
    } catch (error) {
      if (error instanceof ApiError && error.status === 409) {
        // Their change stands and nothing of it is lost; this fix can no longer be taken back as it was.
        dropUndo(tripId, entry.id);
        showToast(
          `Someone changed this since "${entry.summary}" was applied, so it was not undone and their change is kept. Reload to see it.`,
          { tone: 'danger', action: { label: 'Reload', run: () => void invalidateTrip(queryClient, tripId) } },
        );
      } else showToast(failureMessage(error, 'undo'), { tone: 'danger' });
    } finally {
      setBusy(null);
    }
  };

  /** A saved change goes on the undo stack, and its toast offers Undo (one Undo on screen at a time). */
  const offerUndo = (request: UndoFixRequest, summary: string): void => {
    pushUndo(tripId, request, summary);
    if (undoToast !== null) dismissToast(undoToast);
    undoToast = showToast(`Saved: ${summary}`, { action: { label: 'Undo', run: () => void undoLast() } });
  };

  const apply = async (key: string, edits: FixEdit[], rigVersion: number): Promise<boolean> => {
    setBusy(key);
    try {
      const versions: number[] = [];
      for (const edit of edits) versions.push(await save(edit, rigVersion));
      const summary = edits.map((e) => e.summary).join(', ');
      const only = edits.length === 1 ? edits[0] : undefined;
      if (only) offerUndo(undoFor(only, detail, versions[0] ?? 0), summary);
      else showToast(`Saved: ${summary}`);
      return true;
    } catch (error) {
      showToast(failureMessage(error, 'change'), { tone: 'danger' });
      return false;
    } finally {
      setBusy(null);
    }
  };
  /** The fix "Undo last fix" would take back, while this visit has one. */
  const lastFix = stack.at(-1);
  return { apply, offerUndo, busy, undoLast, lastFix, undoCount: stack.length };
}
