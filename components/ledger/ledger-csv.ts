import { toCsv } from '@/shared/csv';
import type { DaySheet, LedgerRow } from '@/shared/engine/result-types';

export type LedgerFilter = { stopIndex: number | null; shortOnly: boolean };

export function filterLedger(rows: LedgerRow[], f: LedgerFilter): LedgerRow[] {
  return rows.filter(
    (r) =>
      (f.stopIndex === null || (r.where.kind === 'stop' && r.where.stopIndex === f.stopIndex)) &&
      (!f.shortOnly || r.energyShortWh > 0 || r.socPct <= 0),
  );
}

/** Figures to one decimal: the ledger's own precision is not meaningful beyond it. */
const tenth = (value: number): number => Math.round(value * 10) / 10;

/** The hourly ledger as CSV, in the engine's units (named in the header). */
export function ledgerCsv(rows: LedgerRow[], stopNames: string[]): string {
  const header = [
    'local time',
    'where',
    'state of charge %',
    'solar used Wh',
    'solar wasted Wh',
    'AC load Wh',
    'DC load Wh',
    'hookup Wh',
    'vehicle Wh',
    'generator Wh',
    'energy short Wh',
    'propane left kg',
    'outside °C',
    'cabin °C',
    'battery °C',
    'battery deliverable %',
  ];
  const lines = rows.map((r) => [
    r.local,
    r.where.kind === 'stop'
      ? (stopNames[r.where.stopIndex] ?? `stop ${r.where.stopIndex + 1}`)
      : `drive ${r.where.driveIndex + 1}`,
    ...[
      r.socPct,
      r.solarUsedWh,
      r.solarWastedWh,
      r.acLoadWh,
      r.dcLoadWh,
      r.hookupWh,
      r.vehicleWh,
      r.generatorWh,
      r.energyShortWh,
      r.propaneLeftKg,
      r.ambientC,
      r.cabinC,
      r.batteryC,
      r.batteryCapacityPct,
    ].map(tenth),
  ]);
  return toCsv([header, ...lines]);
}

/** One line per day of the trip with the stops it touches, in the engine's units (named in the header). */
export function daysCsv(days: DaySheet[], stopNames: string[]): string {
  const header = [
    'date',
    'travel day',
    'stops',
    'harvest Wh',
    'use Wh',
    'net Wh',
    'all sources Wh',
    'losses Wh',
    'hookup Wh',
    'vehicle Wh',
    'generator h',
    'lowest %',
    'end %',
    'energy short Wh',
  ];
  const lines = days.map((d) => [
    d.date,
    d.travel ? 'yes' : 'no',
    d.stopIndexes.map((i) => stopNames[i] ?? `stop ${i + 1}`).join(', '),
    ...[
      d.harvestWh,
      d.useWh,
      d.netWh,
      d.sourcesWh,
      d.lossesWh,
      d.hookupWh,
      d.vehicleWh,
      d.generatorHours,
      d.lowestSocPct,
      d.endSocPct,
      d.energyShortWh,
    ].map(tenth),
  ]);
  return toCsv([header, ...lines]);
}
