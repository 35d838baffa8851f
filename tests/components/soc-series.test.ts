import { toBudgetResult } from '@/shared/budget-result';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  axisTicks,
  dayRange,
  flagMarks,
  indexAt,
  placeFlagLabels,
  placeLabels,
  socSeries,
  wholeTrip,
  type PlacedLabel,
  type SocRange,
} from '@/components/budget/soc-series';
import { DEMO_TRIPS, simulateTrip } from '@/shared/engine';
import type { Flag } from '@/shared/engine/result-types';

const results = Object.entries(DEMO_TRIPS).map(([name, input]) => [name, simulateTrip(input)] as const);
// Nunito SemiBold at 12 px averages about 6.5 px a character; a generous 7.5 keeps the check on the safe side.
const measure = (text: string) => text.length * 7.5;
const scaleFor = (range: SocRange, left: number, right: number) => (x: number) =>
  left + ((x - range.from) / Math.max(1, range.to - range.from)) * (right - left);

const noneOverlap = (labels: PlacedLabel[], gap: number) =>
  labels.every((l, i) => i === 0 || (labels[i - 1]?.left ?? 0) + (labels[i - 1]?.width ?? 0) + gap <= l.left + 1e-9);

describe.each(results)('the %s chart', (_name, result) => {
  const series = socSeries(toBudgetResult(result));

  it('when nothing is chosen, then the range runs from the first hour of the trip to the last', () => {
    const range = wholeTrip(series);
    expect(series.locals[range.from]).toBe(result.ledger[0]?.local);
    expect(series.locals[range.to]).toBe(result.ledger[result.ledger.length - 1]?.local);
  });

  it('when the whole trip is shown, then every local day has a tick', () => {
    const dates = new Set(result.ledger.map((r) => r.local.slice(0, 10)));
    expect(axisTicks(series, wholeTrip(series))).toHaveLength(dates.size);
  });

  it('when one day is chosen, then the range runs from its first hour to the next day’s first hour', () => {
    const second = series.days[1];
    const third = series.days[2];
    if (!second || !third) throw new Error('demo trips last more than two days');
    expect(dayRange(series, 1)).toEqual({ from: second.x, to: third.x });
    const last = series.days.length - 1;
    expect(dayRange(series, last).to).toBe(series.points.length - 1);
    // A day shows its hours on the axis, every six hours.
    const ticks = axisTicks(series, dayRange(series, 1)).map((t) => t.text);
    expect(ticks).toEqual(['00:00', '06:00', '12:00', '18:00', '00:00']);
  });

  it('when the trip has flags, then every flag is marked, numbered in list order, at its hour', () => {
    const numbers = series.flags.flatMap((f) => f.numbers).sort((a, b) => a - b);
    expect(numbers).toEqual(result.flags.map((_f, i) => i + 1));
    for (const mark of series.flags)
      for (const n of mark.numbers) {
        const flag = result.flags[n - 1];
        expect(Date.parse(result.ledger[mark.x]?.utc ?? '')).toBe(Date.parse(flag?.atUtc ?? ''));
      }
  });

  it('when the lowest point is marked, then it is the lowest charge of the trip', () => {
    expect(series.lowest.soc).toBeCloseTo(Math.min(...result.ledger.map((r) => r.socPct)), 6);
    expect(series.lowest.soc).toBeCloseTo(result.headline.lowestSocPct, 6);
  });

  it.each([
    [280, 'a phone'],
    [560, 'a laptop pane'],
    [1000, 'a wide pane'],
  ])('when the plot is %i px wide (%s), then no two day labels overprint and none leaves the plot', (width) => {
    for (const range of [wholeTrip(series), ...series.days.map((d) => dayRange(series, d.dayIndex))]) {
      const left = 40;
      const right = left + width;
      const labels = placeLabels(axisTicks(series, range), {
        scale: scaleFor(range, left, right),
        left,
        right,
        measure,
      });
      expect(labels.length).toBeGreaterThan(0);
      expect(noneOverlap(labels, 8)).toBe(true);
      for (const l of labels) {
        expect(l.left).toBeGreaterThanOrEqual(left);
        expect(l.left + l.width).toBeLessThanOrEqual(right + 1e-9);
      }
    }
  });

  it('when the whole trip is shown on a laptop, then every day gets its label', () => {
    const range = wholeTrip(series);
    const labels = placeLabels(axisTicks(series, range), {
      scale: scaleFor(range, 40, 640),
      left: 40,
      right: 640,
      measure,
    });
    expect(labels.map((l) => l.text)).toEqual(series.days.map((d) => d.label));
  });
});

describe('placeLabels', () => {
  it('when labels would touch, then the later ones are left out rather than printed over', () => {
    const ticks = [
      { x: 0, text: 'Mon 12' },
      { x: 1, text: 'Tue 13' },
      { x: 2, text: 'Wed 14' },
    ];
    const labels = placeLabels(ticks, { scale: (x) => x * 30, left: 0, right: 300, measure });
    expect(labels.map((l) => l.text)).toEqual(['Mon 12', 'Wed 14']);
  });

  it('when the last label would run past the end, then it is pulled back inside', () => {
    const labels = placeLabels([{ x: 10, text: 'Sun 19' }], { scale: (x) => x * 30, left: 0, right: 310, measure });
    expect(labels[0]?.left).toBe(310 - measure('Sun 19'));
  });

  it('when ticks and widths are anything at all, then the placed labels never overlap and stay inside', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ x: fc.integer({ min: 0, max: 500 }), text: fc.string({ minLength: 1, maxLength: 9 }) })),
        fc.integer({ min: 80, max: 1500 }),
        (ticks, width) => {
          const labels = placeLabels(ticks, { scale: (x) => (x / 500) * width, left: 0, right: width, measure });
          return noneOverlap(labels, 8) && labels.every((l) => l.left >= 0 && l.left + l.width <= width + 1e-9);
        },
      ),
      // Once found by the property: two labels pushed half a pixel past the left end.
      {
        examples: [
          [
            [
              { x: 0, text: '      ' },
              { x: 169, text: '     ' },
            ],
            90,
          ],
        ],
      },
    );
  });
});

describe('flag labels', () => {
  const flag = (atUtc: string, severity: Flag['severity'] = 'danger'): Flag => ({
    id: atUtc,
    kind: 'energy-short',
    severity,
    atUtc,
    atLocal: atUtc,
    where: { kind: 'stop', stopIndex: 0 },
    cause: '',
    size: { value: 1, unit: 'Wh' },
    window: { firstRow: 0, lastRow: 0, startUtc: atUtc, startLocal: atUtc, endUtc: atUtc, endLocal: atUtc },
    energyShortWh: 1,
    belowReserveWh: 0,
    lowest: { socPct: 0, row: 0, atUtc, atLocal: atUtc },
    drawdown: { firstRow: 0, lastRow: 0 },
    causes: [],
  });
  const utcs = Array.from({ length: 48 }, (_, h) => Date.parse('2027-09-12T00:00:00Z') + h * 3_600_000);

  it('when two flags fall in the same hour, then they share one mark with both numbers', () => {
    const marks = flagMarks([flag('2027-09-12T05:00:00Z'), flag('2027-09-12T05:00:00Z', 'info')], utcs);
    expect(marks).toEqual([{ x: 5, numbers: [1, 2], danger: true }]);
  });

  it('when flag numbers would touch, then they join into one label so no flag goes unmarked', () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: 0, max: 47 }), { minLength: 1, maxLength: 12 }),
        fc.integer({ min: 120, max: 1200 }),
        (hours, width) => {
          const flags = hours.map((h) => flag(new Date(utcs[h] ?? 0).toISOString()));
          const labels = placeFlagLabels(flagMarks(flags, utcs), {
            scale: (x) => (x / 47) * width,
            left: 0,
            right: width,
            measure,
          });
          const shown = labels.flatMap((l) => l.text.split(', ').map(Number)).sort((a, b) => a - b);
          return shown.join() === flags.map((_f, i) => i + 1).join() && noneOverlap(labels, 6);
        },
      ),
    );
  });
});

describe('indexAt', () => {
  const range: SocRange = { from: 24, to: 48 };
  it.each([
    [0, 24],
    [100, 48],
    [50, 36],
    [-20, 24],
    [140, 48],
  ])('when the pointer is at %i px of a 0–100 px plot showing hours 24–48, then it picks hour %i', (px, index) => {
    expect(indexAt(px, 0, 100, range)).toBe(index);
  });
});
