// Re-forecast from a check-in: the rest of the trip walked from the latest reading's charge and propane. The hours
// before the reading are what happened (the check-ins), not what the walk would say, so callers draw the plan as
// made up to it and this forecast after it; flags before the reading are behind the travellers and left out.
import type { EngineInput } from '../schemas/engine-input';
import type { PropaneTank } from '../schemas/rig';
import { propaneKgOf, type CylinderReading } from '../schemas/check-in';
import type { StartState } from '../schemas/start-state';
import type { SimulationResult } from './result-types';
import { simulateParsed } from './simulate';

export type Reading = { at: string; socPct: number; propane: readonly CylinderReading[] };

export type Reforecast = {
  /** The reading walked from, as a start state of the engine. */
  from: StartState;
  /** The ledger row the walk restarts at (the first hour starting at or after the reading). */
  index: number;
  /** The reading's hour in the place's zone, e.g. 2027-09-14T18:00+01:00. */
  fromLocal: string;
  result: SimulationResult;
};

/**
 * Propane left across the rig's cylinders after a reading. A cylinder not read is counted as it was at the start of
 * the trip: people run one cylinder at a time and read that one, while the spare stays sealed.
 */
export function propaneAfterReading(tanks: readonly PropaneTank[], propane: readonly CylinderReading[]): number | null {
  if (propane.length === 0) return null;
  return tanks.reduce((sum, tank, i) => {
    const read = propane.find((c) => c.tank === i);
    return sum + (read ? propaneKgOf(read.reading, tank.propaneKg) : (tank.propaneKg * tank.fillPct) / 100);
  }, 0);
}

/** The reading taken last (by its time, not by when it was typed in). */
export function latestReading<T extends { at: string }>(readings: readonly T[]): T | undefined {
  let latest: T | undefined;
  for (const r of readings) if (!latest || Date.parse(r.at) >= Date.parse(latest.at)) latest = r;
  return latest;
}

/** The trip walked from `reading`; undefined when the reading falls after the trip's last hour. */
export function reforecastFrom(input: EngineInput, reading: Reading): Reforecast | undefined {
  const from: StartState = {
    at: reading.at,
    socPct: reading.socPct,
    propaneKg: propaneAfterReading(input.rig.propaneTanks, reading.propane),
  };
  const atMs = Date.parse(reading.at);
  const result = simulateParsed({ ...input, startState: from });
  const index = result.ledger.findIndex((row) => Date.parse(row.utc) >= atMs);
  const row = result.ledger[index];
  if (!row) return undefined;
  return {
    from,
    index,
    fromLocal: row.local,
    result: {
      ...result,
      flags: result.flags.filter((flag) => Date.parse(flag.atUtc) >= Date.parse(row.utc)),
      // The energy still to come short is counted from the reading on: what fell short before it is behind them.
      headline: {
        ...result.headline,
        energyShortWh: result.ledger.slice(index).reduce((sum, hour) => sum + hour.energyShortWh, 0),
      },
    },
  };
}
