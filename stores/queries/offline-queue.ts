import {
  onlineManager,
  useMutationState,
  useQueryClient,
  type MutationKey,
  type QueryClient,
} from '@tanstack/react-query';
import { showToast } from '../toast-store';
import { ApiError, conflictCurrent } from './api-client';
import { STALE } from './stale';

/**
 * Saves that are kept while the device has no connection: TanStack Query pauses them (network mode "online"), the
 * persister writes the paused ones to IndexedDB with the queries, and they are sent when the connection returns, after
 * a reload too. A restored mutation has no component behind it, so each queued save registers its `mutationFn` (and
 * what it invalidates) as the defaults of its mutation key; the hooks only name the key.
 */
export const QUEUED_SAVE = 'queued-save';

export const queuedSaveKeys = {
  checkIn: [QUEUED_SAVE, 'check-in'] as const,
  applianceSchedule: [QUEUED_SAVE, 'appliance-schedule'] as const,
  appliance: [QUEUED_SAVE, 'appliance'] as const,
};

/** One queue for every kept save: they reach the server in the order they were made. */
const QUEUE_SCOPE = { id: 'saves-in-order' } as const;

type QueuedDefaults<TData, TVariables> = {
  mutationFn: (variables: TVariables) => Promise<TData>;
  onSuccess: (data: TData, variables: TVariables) => Promise<unknown>;
};

/** A save that can wait for the connection: called once per key when the query client is made. */
export function defineQueuedSave<TData, TVariables>(
  queryClient: QueryClient,
  mutationKey: MutationKey,
  { mutationFn, onSuccess }: QueuedDefaults<TData, TVariables>,
): void {
  queryClient.setMutationDefaults(mutationKey, {
    mutationFn: (variables) => mutationFn(variables as TVariables),
    onSuccess: (data, variables) => onSuccess(data as TData, variables as TVariables),
    networkMode: 'online',
    scope: QUEUE_SCOPE,
    // A dropped connection mid-send waits for the next one instead of failing.
    retry: (failureCount, error) => failureCount < 3 && error instanceof ApiError && error.isNetwork,
    // A save that met a newer version waits here, with what was typed, until someone opens the record again.
    gcTime: STALE.DAYS.ONE,
  });
}

// Structural, not `Mutation`: the persister is built against its own copy of the query core's types.
type MutationLike = { state: { isPaused: boolean }; options: { mutationKey?: MutationKey } };

const isQueuedSave = (mutation: MutationLike) => mutation.options.mutationKey?.[0] === QUEUED_SAVE;

/** What the persister keeps: paused saves that know how to run again (a save without defaults could not). */
export const shouldKeepMutation = (mutation: MutationLike) => mutation.state.isPaused && isQueuedSave(mutation);

/** Whether a save started now would wait for the connection. */
export const savesWait = () => !onlineManager.isOnline();

/**
 * Tells the person when a kept save was refused on its way out for a reason other than a conflict (a conflict waits
 * in the queue for its form): no form awaits a kept save, so the refusal would otherwise pass unseen.
 */
export function reportKeptSaveRefusal(error: unknown): void {
  if (conflictCurrent(error)) return;
  const reason = error instanceof Error ? error.message : 'the server refused it.';
  showToast(`A change kept while offline was not saved: ${reason}`, { tone: 'danger' });
}

/**
 * Whether a save just started is kept for later (no connection): if so, the form goes on at once, `whenSent` runs
 * should it still be open when the save goes out, and a refusal is reported (a conflict waits for its form).
 * Otherwise the caller awaits the answer as usual.
 */
export function keptForLater<T>(sent: Promise<T>, whenSent?: (saved: T) => void): boolean {
  if (!savesWait()) return false;
  sent.then(whenSent).catch(reportKeptSaveRefusal);
  return true;
}

/** Sends the saves a reload brought back from the device, in order, reporting any the server refuses. */
export function resumeKeptSaves(queryClient: QueryClient): void {
  for (const mutation of queryClient.getMutationCache().getAll())
    if (mutation.state.isPaused) mutation.continue().catch(reportKeptSaveRefusal);
}

/** How many kept saves are still to reach the server. */
export function useWaitingSaveCount(): number {
  return useMutationState({
    filters: { status: 'pending', predicate: (m) => isQueuedSave(m) && m.state.isPaused },
    select: (m) => m.mutationId,
  }).length;
}

/** Whether a kept save for this record is still waiting for the connection. */
export function useSaveWaiting<TVariables>(mutationKey: MutationKey, matches: (variables: TVariables) => boolean) {
  return (
    useMutationState({
      filters: {
        mutationKey,
        status: 'pending',
        predicate: (m) => m.state.isPaused && matches(m.state.variables as TVariables),
      },
      select: (m) => m.mutationId,
    }).length > 0
  );
}

export type QueuedConflict<TVariables, TCurrent> = {
  /** What this person sent, as they typed it. */
  mine: TVariables;
  /** The record as it now stands on the server. */
  theirs: TCurrent;
  /** Drops the refused save once the person has chosen. */
  settle: () => void;
};

/**
 * The newest save of this record that the server refused with 409, whether it was sent at once or replayed from the
 * queue after the form was closed: the form shows the conflict notice and puts back what was typed.
 */
export function useQueuedConflict<TVariables, TCurrent>(
  mutationKey: MutationKey,
  matches: (variables: TVariables) => boolean,
): QueuedConflict<TVariables, TCurrent> | null {
  const queryClient = useQueryClient();
  const refused = useMutationState({
    filters: {
      mutationKey,
      status: 'error',
      predicate: (m) => conflictCurrent(m.state.error) !== null && matches(m.state.variables as TVariables),
    },
    select: (m) => ({ id: m.mutationId, mine: m.state.variables, theirs: conflictCurrent(m.state.error) }),
  });
  const last = refused.at(-1);
  if (!last) return null;
  return {
    mine: last.mine as TVariables,
    theirs: last.theirs as TCurrent,
    settle: () => {
      const cache = queryClient.getMutationCache();
      // Every refused save of this record goes: the choice answers them all.
      for (const { id } of refused) {
        const mutation = cache.getAll().find((m) => m.mutationId === id);
        if (mutation) cache.remove(mutation);
      }
    },
  };
}

/** What the kept saves of one kind carry, oldest first: screens show them until the server has them. */
export function useKeptSaves<TVariables>(mutationKey: MutationKey): TVariables[] {
  return useMutationState({
    filters: { mutationKey, status: 'pending', predicate: (m) => m.state.isPaused },
    select: (m) => m.state.variables as TVariables,
  });
}

/** What the saves of one kind refused with 409 carried: their records wait for the person's choice. */
export function useRefusedSaves<TVariables>(mutationKey: MutationKey): TVariables[] {
  return useMutationState({
    filters: { mutationKey, status: 'error', predicate: (m) => conflictCurrent(m.state.error) !== null },
    select: (m) => m.state.variables as TVariables,
  });
}
