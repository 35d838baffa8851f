// The hourly ledger as columns (one array per field) and back. A ledger of rows repeats every field's name on every
// hour, which was about half of the budget's bytes; as columns each name is written once, and a row's place is two
// short values. The server sends the columns; the app turns them back into the engine's rows for the Ledger tab,
// the chart's readout and the exports, so everything downstream still reads `LedgerRow`s.
import type { LedgerRow, Where } from './engine/result-types';

/** The ledger fields that are plain numbers (the row's index is its position and is not sent). */
type NumericField = Exclude<
  { [K in keyof LedgerRow]: LedgerRow[K] extends number ? K : never }[keyof LedgerRow],
  'index'
>;

export const LEDGER_NUMBER_FIELDS = [
  'stepH',
  'sunAltitudeDeg',
  'irradianceWm2',
  'ambientC',
  'cabinC',
  'batteryC',
  'batteryCapacityPct',
  'solarAvailableWh',
  'solarUsedWh',
  'solarWastedWh',
  'acLoadWh',
  'dcLoadWh',
  'inverterLossWh',
  'chargerLossWh',
  'batteryLossWh',
  'hookupWh',
  'vehicleWh',
  'generatorWh',
  'generatorH',
  'generatorFuel',
  'propaneBurnedKg',
  'batteryFlowWh',
  'storedWh',
  'socPct',
  'energyShortWh',
  'propaneLeftKg',
] as const satisfies readonly NumericField[];

// A number added to the engine's row and not listed above fails to compile here, rather than vanish on the wire.
type Unlisted = Exclude<NumericField, (typeof LEDGER_NUMBER_FIELDS)[number]>;
const everyNumberListed: [Unlisted] extends [never] ? true : Unlisted = true;
void everyNumberListed;

/** Where a row is, as a one-character kind: `s` at a stop, `d` on a drive. */
export type WhereKind = 's' | 'd';

/** Where each hour is: its kind and the stop's or drive's index. */
export type WhereColumns = { whereKind: WhereKind[]; whereIndex: number[] };

export type LedgerColumns = { utc: string[]; local: string[] } & WhereColumns & {
    [K in (typeof LEDGER_NUMBER_FIELDS)[number]]: number[];
  };

export function whereColumns(rows: readonly LedgerRow[]): WhereColumns {
  return {
    whereKind: rows.map((row) => (row.where.kind === 'stop' ? 's' : 'd')),
    whereIndex: rows.map((row) => (row.where.kind === 'stop' ? row.where.stopIndex : row.where.driveIndex)),
  };
}

export const whereAt = (columns: WhereColumns, i: number): Where =>
  columns.whereKind[i] === 's'
    ? { kind: 'stop', stopIndex: columns.whereIndex[i] ?? 0 }
    : { kind: 'drive', driveIndex: columns.whereIndex[i] ?? 0 };

export function toLedgerColumns(rows: readonly LedgerRow[]): LedgerColumns {
  const numbers = Object.fromEntries(LEDGER_NUMBER_FIELDS.map((field) => [field, rows.map((row) => row[field])])) as {
    [K in (typeof LEDGER_NUMBER_FIELDS)[number]]: number[];
  };
  return {
    utc: rows.map((row) => row.utc),
    local: rows.map((row) => row.local),
    ...whereColumns(rows),
    ...numbers,
  };
}

/** The engine's rows again, in the engine's field order. */
export function fromLedgerColumns(columns: LedgerColumns): LedgerRow[] {
  return columns.utc.map((utc, index) => {
    const row: Record<string, unknown> = { index, utc, local: columns.local[index], where: whereAt(columns, index) };
    for (const field of LEDGER_NUMBER_FIELDS) row[field] = columns[field][index];
    return row as LedgerRow;
  });
}
