import type { DaySheet, LedgerRow } from '@/shared/engine/result-types';

export type LedgerFilter = { stopIndex: number | null; shortOnly: boolean };

export function filterLedger(rows: LedgerRow[], f: LedgerFilter): LedgerRow[] {
  return rows.filter(
    (r) =>
      (f.stopIndex === null || (r.where.kind === 'stop' && r.where.stopIndex === f.stopIndex)) &&
      (!f.shortOnly || r.energyShortWh > 0 || r.socPct <= 0),
  );
}

const cell = (v: string | number): string => {
  const s = typeof v === 'number' ? String(Math.round(v * 10) / 10) : v;
  // Quote anything a spreadsheet could misread: separators, quotes, line breaks, or a leading formula sign.
  return /[",\n\r]|^[=+\-@]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
};

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
  const lines = rows.map((r) =>
    [
      r.local,
      r.where.kind === 'stop'
        ? (stopNames[r.where.stopIndex] ?? `stop ${r.where.stopIndex + 1}`)
        : `drive ${r.where.driveIndex + 1}`,
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
    ]
      .map(cell)
      .join(','),
  );
  return [header.map(cell).join(','), ...lines].join('\r\n') + '\r\n';
}

export function daysCsv(days: DaySheet[]): string {
  const header = [
    'date',
    'travel day',
    'harvest Wh',
    'use Wh',
    'net Wh',
    'hookup Wh',
    'vehicle Wh',
    'generator h',
    'lowest %',
    'end %',
    'energy short Wh',
  ];
  const lines = days.map((d) =>
    [
      d.date,
      d.travel ? 'yes' : 'no',
      d.harvestWh,
      d.useWh,
      d.netWh,
      d.hookupWh,
      d.vehicleWh,
      d.generatorHours,
      d.lowestSocPct,
      d.endSocPct,
      d.energyShortWh,
    ]
      .map(cell)
      .join(','),
  );
  return [header.join(','), ...lines].join('\r\n') + '\r\n';
}
