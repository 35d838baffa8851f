// Sky outlook: a clearness factor applied to clear-sky GHI per preset. These are planning factors, not a
// published model: common practice (and from memory) is that thin haze or smoke cuts a day's harvest by a third
// to a half or more, broken cloud by about half, and a solid overcast leaves 10–25 % of a clear day.
import type { SkyOutlook } from '../schemas/trip';

export const SKY_ORDER: readonly SkyOutlook[] = ['clear', 'hazy', 'broken-cloud', 'overcast'];

export const SKY_CLEARNESS: Readonly<Record<SkyOutlook, number>> = {
  clear: 1, // the clear-sky model itself
  hazy: 0.65, // haze/smoke: "can cut harvest by half or more" (common practice); 0.65 for ordinary haze
  'broken-cloud': 0.5, // from memory: broken cumulus days average about half of clear
  overcast: 0.2, // from memory: overcast days deliver roughly 10–25 % of clear-sky energy
};

/** The outlook `steps` levels better (negative) or worse (positive), clamped to the ends. */
export function shiftSky(sky: SkyOutlook, steps: number): SkyOutlook {
  const i = SKY_ORDER.indexOf(sky);
  const j = Math.min(SKY_ORDER.length - 1, Math.max(0, i + steps));
  return SKY_ORDER[j] ?? sky;
}
