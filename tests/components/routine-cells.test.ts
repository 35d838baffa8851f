import { describe, expect, it } from 'vitest';
import {
  cellsFor,
  cellsPerRow,
  dailyWh,
  describeWindow,
  formatWindow,
  hoursOfWindow,
  MIN_CELL_WIDTH,
  paintRange,
  runsOf,
  setLength,
  setStart,
  toggleCell,
  windowsFromCells,
  type Cells,
} from '@/components/loads/routine-cells';
import { parseClock } from '@/components/ui/time-of-day-field.types';
import type { RoutineWindow } from '@/shared/schemas/common';

const all = { kind: 'all' } as const;
const camp = { kind: 'day-type', dayType: 'camp' } as const;
const win = (
  startHour: number,
  minutes: number,
  startMinute = 0,
  days: RoutineWindow['days'] = all,
): RoutineWindow => ({ days, startHour, startMinute, minutes });
const lit = (...hours: number[]): Cells => Array.from({ length: 24 }, (_, h) => hours.includes(h));

describe('hoursOfWindow', () => {
  it.each([
    ['a whole hour', win(7, 60), [7]],
    ['ten minutes at half past', win(7, 10, 30), [7]],
    ['a window that ends exactly on the hour', win(18, 120), [18, 19]],
    ['crossing into the next hour', win(7, 40, 30), [7, 8]],
    ['across midnight', win(22, 180), [22, 23, 0]],
    ['a whole day', win(0, 1440), Array.from({ length: 24 }, (_, h) => h)],
  ])('when %s, then it lights the right cells', (_name, w, hours) => {
    expect(hoursOfWindow(w).sort((a, b) => a - b)).toEqual([...hours].sort((a, b) => a - b));
  });
});

describe('runsOf', () => {
  it.each([
    ['nothing lit', lit(), []],
    ['one run', lit(7, 8, 9), [[7, 3]]],
    [
      'two runs',
      lit(7, 19, 20),
      [
        [7, 1],
        [19, 2],
      ],
    ],
    ['a run across midnight is one run', lit(22, 23, 0, 1), [[22, 4]]],
    ['every hour', lit(...Array.from({ length: 24 }, (_, h) => h)), [[0, 24]]],
  ])('when %s, then the runs are found', (_name, cells, runs) => {
    expect(runsOf(cells)).toEqual(runs);
  });
});

describe('cells and windows', () => {
  it('when a cell is toggled on next to a window, then the windows merge into one run', () => {
    const next = toggleCell([win(19, 60)], 'all', 20);
    expect(next).toEqual([win(19, 120)]);
  });

  it('when a cell is toggled off in the middle, then the window splits in two', () => {
    const next = toggleCell([win(18, 180)], 'all', 19);
    expect(next).toEqual([win(18, 60), win(20, 60)]);
  });

  it('when another cell changes, then a short window keeps its minutes and start minute', () => {
    const hairDryer = win(7, 10, 30);
    const next = toggleCell([hairDryer], 'all', 21);
    expect(next).toContainEqual(hairDryer);
    expect(next).toContainEqual(win(21, 60));
  });

  it('when the camp-day strip is edited, then the every-day windows are untouched', () => {
    const everyDay = win(7, 10);
    const next = toggleCell([everyDay, win(8, 60, 0, camp)], 'camp', 8);
    expect(next).toEqual([everyDay]);
    expect(cellsFor(next, 'camp').some(Boolean)).toBe(false);
  });

  it('when windows for particular trip days exist, then editing a strip keeps them', () => {
    const special = win(12, 30, 0, { kind: 'trip-days', dayIndexes: [2] });
    expect(toggleCell([special], 'all', 5)).toContainEqual(special);
  });

  it('when a drag paints from 23 back to 20, then hours 20–23 are lit as one window', () => {
    expect(paintRange([], 'all', 23, 20, true)).toEqual([win(20, 240)]);
  });

  it('when cells wrap past midnight, then one window crosses midnight', () => {
    expect(windowsFromCells(lit(23, 0), 'all', [])).toEqual([win(23, 120)]);
  });
});

describe('start and length are independent', () => {
  const hairDryer = win(7, 10, 30);

  it('when the length changes, then the start stays', () => {
    const [next] = setLength([hairDryer], 0, 15);
    expect(next).toEqual(win(7, 15, 30));
    expect(next && formatWindow(next)).toBe('07:30–07:45');
  });

  it('when the length grows past the hour, then the start stays and the strip lights the next hour too', () => {
    const next = setLength([hairDryer], 0, 90);
    expect(next).toEqual([win(7, 90, 30)]);
    expect(cellsFor(next, 'all').flatMap((on, h) => (on ? [h] : []))).toEqual([7, 8]);
  });

  it('when the start minute changes, then the length stays', () => {
    expect(setStart([hairDryer], 0, 7, 45)).toEqual([win(7, 10, 45)]);
  });

  it('when the start hour changes, then the minute and the length stay', () => {
    expect(setStart([hairDryer], 0, 19, 30)).toEqual([win(19, 10, 30)]);
  });

  it('when a start minute off the five-minute step is given, then it is rounded to the step', () => {
    expect(setStart([hairDryer], 0, 7, 33)).toEqual([win(7, 10, 35)]);
    expect(setStart([hairDryer], 0, 7, 58)).toEqual([win(7, 10, 55)]);
  });

  it('when only one window of several is edited, then the others are untouched', () => {
    const laptop = win(19, 180);
    expect(setLength([laptop, hairDryer], 1, 20)).toEqual([laptop, win(7, 20, 30)]);
    expect(setStart([laptop, hairDryer], 1, 6, 0)).toEqual([laptop, win(6, 10, 0)]);
  });

  it('when a length outside a minute to a day is given, then it is held to that span', () => {
    expect(setLength([hairDryer], 0, 0)).toEqual([win(7, 1, 30)]);
    expect(setLength([hairDryer], 0, 5000)).toEqual([win(7, 1440, 30)]);
  });
});

describe('describeWindow', () => {
  it.each([
    [win(7, 10, 30), '07:30–07:40, 10 min, every day'],
    [win(19, 180, 0, camp), '19:00–22:00, 3 h, camp days'],
    [win(6, 90, 15, { kind: 'day-type', dayType: 'travel' }), '06:15–07:45, 1 h 30 min, travel days'],
    [win(12, 30, 0, { kind: 'trip-days', dayIndexes: [0, 2] }), '12:00–12:30, 30 min, trip days 1, 3'],
  ])('when a window is described, then it reads in words', (w, words) => {
    expect(describeWindow(w)).toBe(words);
  });
});

describe('cellsPerRow', () => {
  it.each([
    [280, 6],
    [328, 6],
    [470, 8],
    [640, 12],
  ])('when the strip is %i px wide, then %i cells go in a row', (width, n) => {
    expect(cellsPerRow(width, 4)).toBe(n);
  });

  it('when any width from 140 to 1400 px is given, then every cell keeps its size and the row fits', () => {
    for (let width = 140; width <= 1400; width += 7) {
      const n = cellsPerRow(width, 4);
      expect(24 % n).toBe(0);
      expect((width - 4 * (n - 1)) / n).toBeGreaterThanOrEqual(MIN_CELL_WIDTH);
    }
  });
});

describe('dailyWh and formatWindow', () => {
  it('when a 60 W laptop runs 3 h, then it uses 180 Wh a day', () => {
    expect(dailyWh([win(19, 180)], 'all', 60, 1)).toBe(180);
  });
  it('when a fridge cycles at a third duty all day, then energy scales with it', () => {
    expect(dailyWh([win(0, 1440)], 'all', 45, 1 / 3)).toBeCloseTo(360);
  });
  it.each([
    [win(7, 10, 30), '07:30–07:40'],
    [win(22, 180), '22:00–01:00'],
  ])('when a window is shown, then it reads as a time range', (w, label) => {
    expect(formatWindow(w)).toBe(label);
  });
});

describe('parseClock', () => {
  it.each([
    ['07:30', [7, 30]],
    ['07:33', [7, 35]],
    ['23:58', [23, 55]],
    ['7:05', [7, 5]],
    ['', null],
    ['25:00', null],
    ['07:', null],
  ])('when the time field holds “%s”, then it reads as %j', (text, expected) => {
    expect(parseClock(text)).toEqual(expected);
  });
});
