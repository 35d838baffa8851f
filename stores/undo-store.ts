import { create } from 'zustand';
import type { UndoFixRequest } from '@/shared/schemas/api';

// The fixes applied in this visit, newest last, per trip: each entry is the request that puts its one record back
// (the record as it stood before the fix, with its version). It is an action history, not a copy of server data: it
// lives only in memory, so a reload starts a new visit with nothing to undo.
export type UndoEntry = { id: number; request: UndoFixRequest; summary: string };

type UndoState = { byTrip: Record<string, UndoEntry[]> };

export const useUndoStore = create<UndoState>(() => ({ byTrip: {} }));

let nextId = 1;
// Enough for any run of fixes in one sitting; the oldest drop off first.
const KEEP = 20;

export function pushUndo(tripId: string, request: UndoFixRequest, summary: string): UndoEntry {
  const entry = { id: nextId++, request, summary };
  useUndoStore.setState((s) => ({
    byTrip: { ...s.byTrip, [tripId]: [...(s.byTrip[tripId] ?? []), entry].slice(-KEEP) },
  }));
  return entry;
}

/** The fix to undo next: the latest one applied. */
export function latestUndo(tripId: string): UndoEntry | undefined {
  return useUndoStore.getState().byTrip[tripId]?.at(-1);
}

export function dropUndo(tripId: string, id: number): void {
  useUndoStore.setState((s) => ({
    byTrip: { ...s.byTrip, [tripId]: (s.byTrip[tripId] ?? []).filter((e) => e.id !== id) },
  }));
}

const NONE: UndoEntry[] = [];

export function useUndoStack(tripId: string): UndoEntry[] {
  return useUndoStore((s) => s.byTrip[tripId] ?? NONE);
}
