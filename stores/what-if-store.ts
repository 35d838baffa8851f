import { create } from 'zustand';

/** Unsaved what-if changes for one trip; none of them reach the server until the user keeps one. */
export type WhatIf = {
  extraBattery: boolean;
  extraSolar: boolean;
  skipHookup: boolean;
  worseSky: boolean;
};

export type WhatIfKey = keyof WhatIf;

export const NO_WHAT_IF: WhatIf = { extraBattery: false, extraSolar: false, skipHookup: false, worseSky: false };

type WhatIfState = { byTrip: Record<string, WhatIf> };

export const useWhatIfStore = create<WhatIfState>(() => ({ byTrip: {} }));

export function toggleWhatIf(tripId: string, key: WhatIfKey): void {
  useWhatIfStore.setState((s) => {
    const current = s.byTrip[tripId] ?? NO_WHAT_IF;
    return { byTrip: { ...s.byTrip, [tripId]: { ...current, [key]: !current[key] } } };
  });
}

export function clearWhatIf(tripId: string, key?: WhatIfKey): void {
  useWhatIfStore.setState((s) => {
    const current = s.byTrip[tripId] ?? NO_WHAT_IF;
    return { byTrip: { ...s.byTrip, [tripId]: key ? { ...current, [key]: false } : NO_WHAT_IF } };
  });
}

export const useWhatIf = (tripId: string): WhatIf => useWhatIfStore((s) => s.byTrip[tripId] ?? NO_WHAT_IF);

export const anyWhatIf = (w: WhatIf): boolean => w.extraBattery || w.extraSolar || w.skipHookup || w.worseSky;
