import { describe, expect, it } from 'vitest';
import { socTrack, toBudgetResult } from '@/shared/budget-result';
import { DEMO_TRIPS } from '@/shared/engine/demo-trips';
import { simulateTrip } from '@/shared/engine';
import { fromLedgerColumns, toLedgerColumns } from '@/shared/ledger-columns';
import { ledgerColumnsSchema } from '@/shared/schemas/budget-response';
import { ledgerRowsOf } from '@/stores/queries/budget';

/** What crosses the wire: a value written as JSON and read back (as the rows were sent before the columns). */
const overTheWire = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

describe.each(Object.entries(DEMO_TRIPS))('the %s ledger as columns', (_name, trip) => {
  const result = simulateTrip(trip);

  it("when columns are sent and turned back into rows, then they equal the engine's rows field for field", () => {
    const columns = overTheWire(toLedgerColumns(result.ledger));
    expect(ledgerColumnsSchema.safeParse(columns).success).toBe(true);
    expect(fromLedgerColumns(columns)).toEqual(overTheWire(result.ledger));
  });

  it("when the app reads the ledger route's answer, then it gets the engine's rows and the version", () => {
    const response = overTheWire({ version: 7, ledger: toLedgerColumns(result.ledger) });
    expect(ledgerRowsOf(response)).toEqual({ version: 7, rows: overTheWire(result.ledger) });
  });

  it('when the ledger is written as columns, then it takes at most half the bytes of the rows', () => {
    const rows = JSON.stringify(result.ledger).length;
    expect(JSON.stringify(toLedgerColumns(result.ledger)).length).toBeLessThan(rows / 2);
  });

  it('when the budget is made, then it carries no ledger and its track follows the ledger hour by hour', () => {
    const budget = toBudgetResult(result);
    expect(budget).not.toHaveProperty('ledger');
    expect(budget.soc.socPct).toEqual(result.ledger.map((row) => row.socPct));
    expect(budget.soc.utc).toEqual(result.ledger.map((row) => row.utc));
    expect(fromLedgerColumns(toLedgerColumns(result.ledger)).map((row) => row.where)).toEqual(
      result.ledger.map((row) => row.where),
    );
  });
});

describe('a ledger with drives', () => {
  it('when a row is on a drive, then its place comes back as the same drive', () => {
    const rows = simulateTrip(DEMO_TRIPS.highlandLoop).ledger;
    const drives = rows.filter((row) => row.where.kind === 'drive');
    expect(drives.length).toBeGreaterThan(0);
    const track = socTrack(rows);
    expect(track.whereKind.filter((kind) => kind === 'd')).toHaveLength(drives.length);
    const back = fromLedgerColumns(toLedgerColumns(drives));
    expect(back.map((row) => row.where)).toEqual(drives.map((row) => row.where));
  });
});
