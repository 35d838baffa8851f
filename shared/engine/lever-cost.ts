// Which of the headroom finder's levers is the cheapest way to hold the reserve on this trip: each found lever is
// priced at a rough outlay for this trip, and the lowest wins. The prices are common practice (typical retail for
// an RV or camper build, in US dollars, rounded; they only rank the levers, so their currency does not matter):
// - battery: lithium iron phosphate drop-in modules, about 0.30 per Wh (a 12 V 100 Ah module near 400);
// - solar: about 1.50 per W on the roof, with its share of charge controller, mounting and cable;
// - generator: about 1.00 per running hour (fuel and wear of a 2 kW class set), plus 600 to buy one when the rig
//   has none;
// - hookup: about 20 per night, what a powered site costs over an unpowered one.
// A lever that is not needed, cannot fix, or does not apply is never the cheapest.
import type { HeadroomLever, HeadroomResult } from './headroom';

export const LEVER_PRICES = {
  batteryPerWh: 0.3,
  solarPerW: 1.5,
  generatorPerHour: 1,
  generatorPurchase: 600,
  hookupPerNight: 20,
} as const;

const num = (v: unknown): number => (typeof v === 'number' && Number.isFinite(v) ? v : 0);

/** Rough outlay of a found lever for this trip, or null when the lever has nothing to price. */
export function leverOutlay(l: HeadroomLever): number | null {
  if (l.status !== 'found') return null;
  switch (l.lever) {
    case 'battery':
      return num(l.params.extraWh) * LEVER_PRICES.batteryPerWh;
    case 'solar':
      return l.amount * LEVER_PRICES.solarPerW;
    case 'generator':
      return (
        l.amount * LEVER_PRICES.generatorPerHour +
        (l.params.assumedGenerator === true ? LEVER_PRICES.generatorPurchase : 0)
      );
    case 'hookup':
      return l.amount * LEVER_PRICES.hookupPerNight;
  }
}

/** The lever with the lowest outlay (the first listed on a tie), or null when no lever was found. */
export function cheapestLever(result: HeadroomResult): HeadroomLever['lever'] | null {
  let best: { lever: HeadroomLever['lever']; outlay: number } | null = null;
  for (const l of result.levers) {
    const outlay = leverOutlay(l);
    if (outlay !== null && (best === null || outlay < best.outlay)) best = { lever: l.lever, outlay };
  }
  return best?.lever ?? null;
}
