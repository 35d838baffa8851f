// The fixes of the budget's flags, fetched (or, for a what-if, checked in the app) only once the flags are on
// screen: checking walks the trip dozens of times, so the budget itself never waits for it.
import { useQueryClient } from '@tanstack/react-query';
import { useEffect, useMemo, useState } from 'react';
import type { FlagFixes } from '@/shared/engine/result-types';
import type { EngineInputDraft } from '@/shared/schemas/engine-input';
import { useBudgetFixesQuery } from '@/stores/queries/budget';
import { tripKeys } from '@/stores/queries/trips';
import { checkFixesCached } from './simulate-cached';
import type { BudgetView } from './use-budget-view';

export type FixesView =
  | { state: 'loading' }
  | { state: 'error'; error: unknown; retry: () => void }
  | { state: 'ready'; fixes: FlagFixes[] }
  /** The last plan's fixes, shown (not applicable) while the edited plan's are checked. */
  | { state: 'rechecking'; fixes: FlagFixes[] };

const NONE: FixesView = { state: 'ready', fixes: [] };

/** A what-if's fixes, checked after the what-if's budget has painted (the next task, not during render). */
function useWhatIfFixes(input: EngineInputDraft | null): FixesView {
  const key = useMemo(() => (input ? JSON.stringify(input) : ''), [input]);
  const [done, setDone] = useState<{ key: string; view: FixesView } | null>(null);
  const [attempt, setAttempt] = useState(0);
  useEffect(() => {
    if (!input) return undefined;
    const timer = setTimeout(() => {
      const checked = checkFixesCached(input, key);
      setDone({
        key,
        view: checked.fixes
          ? { state: 'ready', fixes: checked.fixes }
          : { state: 'error', error: new Error(checked.error ?? ''), retry: () => setAttempt((n) => n + 1) },
      });
    }, 0);
    return () => clearTimeout(timer);
    // The input is read through its key: a new object with the same content is the same what-if.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [key, attempt]);
  return done?.key === key ? done.view : { state: 'loading' };
}

/**
 * While the fixes of an edited plan are checked, the last ones stay on screen, marked as being checked again: the
 * list keeps its height, so an Apply or Undo does not collapse it and spring it back under the reader's eyes.
 */
function useHeldWhileChecking(tripId: string, view: FixesView): FixesView {
  const [held, setHeld] = useState<{ tripId: string; fixes: FlagFixes[] } | null>(null);
  // Kept as state set while rendering (React's pattern for remembering the last props), not in an effect: the held
  // list must already be there on the render where the new one starts loading.
  if (view.state === 'ready' && (held?.tripId !== tripId || held.fixes !== view.fixes))
    setHeld({ tripId, fixes: view.fixes });
  if (view.state === 'loading' && held?.tripId === tripId) return { state: 'rechecking', fixes: held.fixes };
  return view;
}

export function useFlagFixes(tripId: string, view: BudgetView): FixesView {
  return useHeldWhileChecking(tripId, useFlagFixesNow(tripId, view));
}

function useFlagFixesNow(tripId: string, view: BudgetView): FixesView {
  const ready = view.state === 'ready' ? view : null;
  const shown = (ready?.result.flags.length ?? 0) > 0;
  const whatIfInput = shown ? (ready?.input ?? null) : null;
  const version = ready && !ready.input ? ready.version : null;
  const server = useBudgetFixesQuery(tripId, version, shown && version !== null);
  const local = useWhatIfFixes(whatIfInput);
  const queryClient = useQueryClient();
  // Fixes computed for a newer revision than the budget on screen: the budget is behind, so fetch it again.
  const behind = server.data !== undefined && version !== null && server.data.version > version;
  useEffect(() => {
    if (behind) void queryClient.invalidateQueries({ queryKey: tripKeys.budget(tripId), exact: true });
  }, [behind, queryClient, tripId]);
  if (!shown) return NONE;
  if (whatIfInput) return local;
  if (server.isError) return { state: 'error', error: server.error, retry: () => void server.refetch() };
  if (!server.data || server.data.version !== version) return { state: 'loading' };
  return { state: 'ready', fixes: server.data.fixes };
}
