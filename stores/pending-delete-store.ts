import { create } from 'zustand';

/**
 * Deletions wait a few seconds before they reach the server, so "Undo" can simply cancel them.
 * The list hides a pending item at once.
 */
type PendingState = { ids: string[] };

export const usePendingDeleteStore = create<PendingState>(() => ({ ids: [] }));
const timers = new Map<string, ReturnType<typeof setTimeout>>();
export const UNDO_MS = 6000;

export function scheduleDelete(id: string, run: () => Promise<unknown>, onFail: () => void): void {
  usePendingDeleteStore.setState((s) => ({ ids: [...s.ids, id] }));
  timers.set(
    id,
    setTimeout(() => {
      timers.delete(id);
      run()
        .catch(onFail)
        .finally(() => usePendingDeleteStore.setState((s) => ({ ids: s.ids.filter((x) => x !== id) })));
    }, UNDO_MS),
  );
}

export function undoDelete(id: string): void {
  const t = timers.get(id);
  if (t) clearTimeout(t);
  timers.delete(id);
  usePendingDeleteStore.setState((s) => ({ ids: s.ids.filter((x) => x !== id) }));
}
