// One source for every figure: the headline, each flag's title, its text and the ledger rows it spans agree, for the
// golden inputs and for random plans.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { simulateTrip } from '@/shared/engine';
import { momentText, nameInSentence } from '@/shared/engine/flag-text';
import { hasMoment, isShortfall } from '@/shared/engine/flags';
import type { SimulationResult } from '@/shared/engine/result-types';
import { flagTitle } from '@/shared/flag-titles';
import { build, tripArb } from '@/tests/factories/random-plan';
import { GOLDEN_CASES } from './golden-inputs';

const MOMENT = /(Mon|Tue|Wed|Thu|Fri|Sat|Sun) \d{1,2} [A-Z][a-z]{2}, \d\d:\d\d/g;

/** Every equality the flags promise, checked against the result's own ledger. */
function expectOneSource(r: SimulationResult): void {
  const sumFlags = r.flags.reduce((s, f) => (isShortfall(f) ? s + f.energyShortWh : s), 0);
  const sumLedger = r.ledger.reduce((s, row) => s + row.energyShortWh, 0);
  expect(r.headline.energyShortWh).toBeCloseTo(sumFlags, 6);
  expect(sumFlags).toBeCloseTo(sumLedger, 6);
  for (const flag of r.flags) {
    const { firstRow, lastRow } = flag.window;
    const rows = r.ledger.slice(firstRow, lastRow + 1);
    const first = rows[0];
    const last = rows[rows.length - 1];
    if (!first || !last) throw new Error(`flag ${flag.id} spans no rows`);
    expect(flag.window.startUtc).toBe(first.utc);
    expect(flag.window.startLocal).toBe(first.local);
    const next = r.ledger[lastRow + 1];
    const endMs = Date.parse(last.utc) + last.stepH * 3_600_000;
    expect(Date.parse(flag.window.endUtc)).toBe(endMs);
    if (next) expect(flag.window.endUtc).toBe(next.utc);
    expect(flag.energyShortWh).toBeCloseTo(
      rows.reduce((s, row) => s + row.energyShortWh, 0),
      6,
    );
    const lowestRow = r.ledger[flag.lowest.row];
    expect(lowestRow?.socPct).toBe(Math.min(...rows.map((row) => row.socPct)));
    expect(flag.lowest.socPct).toBe(lowestRow?.socPct);
    expect(flag.lowest.atUtc).toBe(lowestRow?.utc);
    expect(flag.lowest.atLocal).toBe(lowestRow?.local);
    expect(flag.atUtc).toBe(flag.lowest.atUtc);
    // The header's moment is in the text, and every moment in the text is one of the flag's own.
    const header = momentText(flag.atLocal);
    if (hasMoment(flag)) expect(flag.cause).toContain(header);
    else expect(flag.cause.match(MOMENT)).toBeNull();
    const own = new Set([header, momentText(flag.window.startLocal), momentText(flag.window.endLocal)]);
    for (const shown of flag.cause.match(MOMENT) ?? []) expect(own).toContain(shown);
    if (flag.kind === 'energy-short' || flag.kind === 'below-reserve') {
      // The title's figure is the text's, written the same way.
      const figure = flagTitle(flag).split(' · ')[1] ?? '';
      expect(flag.cause).toContain(figure);
      expect(flag.size.value).toBe(Math.round(flag.kind === 'energy-short' ? flag.energyShortWh : flag.belowReserveWh));
    }
  }
}

describe('one source for every figure', () => {
  for (const [name, input] of Object.entries(GOLDEN_CASES)) {
    it(`when ${name} is simulated, then the headline, the flags and the ledger rows agree`, () => {
      expectOneSource(simulateTrip(input));
    });
  }

  it('when any random plan is simulated, then the headline, the flags and the ledger rows agree', () => {
    fc.assert(
      fc.property(tripArb, (t) => expectOneSource(simulateTrip(build(t)))),
      { numRuns: 60, seed: 10 },
    );
  });

  it('when a flag is written, then its header time is the time in its text (not the hour after)', () => {
    const input = GOLDEN_CASES['demo-highland-loop'];
    if (!input) throw new Error('missing case');
    const r = simulateTrip(input);
    const shortfalls = r.flags.filter((f) => f.kind === 'below-reserve' || f.kind === 'energy-short');
    for (const f of shortfalls) expect(f.cause).toContain(`at ${momentText(f.atLocal)}`);
  });
});

describe('moment text', () => {
  it.each([
    ['2027-09-14T13:00+01:00', 'Tue 14 Sep, 13:00'],
    ['2027-01-01T00:30-08:00', 'Fri 1 Jan, 00:30'],
    ['2027-04-04T23:00+10:00', 'Sun 4 Apr, 23:00'],
  ])('when the local label is %s, then it reads %s (its own wall clock)', (iso, want) => {
    expect(momentText(iso)).toBe(want);
  });
});

describe('appliance names inside a sentence', () => {
  it.each([
    ['Roof air conditioner', 'roof air conditioner'],
    ['Fridge', 'fridge'],
    ['Fan-assisted propane heater', 'fan-assisted propane heater'],
    ['A/C unit', 'A/C unit'],
    ['TV', 'TV'],
    ['LED strip lights', 'LED strip lights'],
    ['12 V compressor fridge', '12 V compressor fridge'],
    ['eBike charger', 'eBike charger'],
  ])('when the name is %s, then a flag or fix writes %s', (name, want) => {
    expect(nameInSentence(name)).toBe(want);
  });
});
