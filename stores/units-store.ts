import { create } from 'zustand';
import { DEFAULT_PREFERENCES, preferencesSchema } from '@/shared/schemas/preferences';
import type { UnitSystem } from '@/shared/units';

// Persisted under a versioned key so a future shape can be migrated instead of misread.
export const UNITS_STORAGE_KEY = 'trailtally.preferences.v1';

type UnitsState = { units: UnitSystem; hydrated: boolean };

export const useUnitsStore = create<UnitsState>(() => ({ units: DEFAULT_PREFERENCES.units, hydrated: false }));

function storage(): Storage | null {
  try {
    return typeof window !== 'undefined' && window.localStorage ? window.localStorage : null;
  } catch {
    // Private browsing modes may throw on access; the app then runs on defaults.
    return null;
  }
}

/** Reads what is stored, checked by the schema; anything unreadable falls back to the documented default. */
export function readStoredUnits(raw: string | null): UnitSystem {
  if (!raw) return DEFAULT_PREFERENCES.units;
  try {
    const parsed = preferencesSchema.safeParse(JSON.parse(raw));
    return parsed.success ? parsed.data.units : DEFAULT_PREFERENCES.units;
  } catch {
    return DEFAULT_PREFERENCES.units;
  }
}

/** Call once at start, before the first screen reads units. */
export function hydrateUnits(): void {
  useUnitsStore.setState({ units: readStoredUnits(storage()?.getItem(UNITS_STORAGE_KEY) ?? null), hydrated: true });
}

export function setUnits(units: UnitSystem): void {
  useUnitsStore.setState({ units });
  storage()?.setItem(UNITS_STORAGE_KEY, JSON.stringify({ units }));
}

export const useUnits = (): UnitSystem => useUnitsStore((s) => s.units);
