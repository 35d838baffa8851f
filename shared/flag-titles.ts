import { flagSizeText } from './engine/flag-text';
import type { Flag } from './engine/result-types';

/** Each flag's name as the screens, the calendar and the trip sheet show it. */
export const FLAG_TITLE: Record<Flag['kind'], string> = {
  'below-reserve': 'Below the reserve',
  'energy-short': 'Energy short',
  'inverter-overload': 'Inverter overloaded',
  'cold-charge-blocked': 'Too cold to charge',
  'propane-out': 'Propane runs out',
  'high-dc-current': 'High DC current',
};

/** A flag's title: its name and its size, the same figure its text gives. */
export function flagTitle(flag: Pick<Flag, 'kind' | 'size'>): string {
  return `${FLAG_TITLE[flag.kind]} · ${flagSizeText(flag)}`;
}
