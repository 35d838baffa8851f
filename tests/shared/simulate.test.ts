import { describe, expect, it } from 'vitest';
import { CHEMISTRY, checkFixes, findHeadroom, pvwattsDcW, simulateTrip, withFixes } from '@/shared/engine';
import { desertSpringLoop, highlandLoop } from '@/tests/fixtures/demo-trips';
import { constantLoad, simpleTrip } from './trip-builder';

describe('closed-form cases', () => {
  it('when a constant DC load runs with no sources, then the battery drains exactly load × hours ÷ efficiency', () => {
    const r = simulateTrip(simpleTrip({ capacityAh: 200, appliances: [constantLoad('load', 'dc', 50)] }));
    const eff = CHEMISTRY.lifepo4.dischargeEfficiency; // 50 W at 12.8 V is under the 20-hour current: no Peukert term
    const expectedWh = (50 * 24) / eff;
    const last = r.ledger[r.ledger.length - 1];
    expect(200 * 12.8 - (last?.storedWh ?? 0)).toBeCloseTo(expectedWh, 6);
  });

  it('when an AC load runs through the inverter, then the drain follows the inverter’s part-load curve', () => {
    const r = simulateTrip(
      simpleTrip({ capacityAh: 200, inverter: true, appliances: [constantLoad('load', 'ac', 45)] }),
    );
    const expectedWh = (pvwattsDcW(45, 2000, 0.9) * 24) / CHEMISTRY.lifepo4.dischargeEfficiency;
    expect(200 * 12.8 - (r.ledger.at(-1)?.storedWh ?? 0)).toBeCloseTo(expectedWh, 6);
  });

  it('when a full battery meets big solar and a small load, then the surplus is wasted and the charge stays full', () => {
    const r = simulateTrip(simpleTrip({ solarW: 2000, appliances: [constantLoad('load', 'dc', 20)] }));
    const h = r.headline;
    expect(h.solarWastedWh).toBeGreaterThan(5000);
    const availableWh = r.ledger.reduce((s, row) => s + row.solarAvailableWh, 0);
    expect(h.solarUsedWh + h.solarWastedWh).toBeCloseTo(availableWh, 6);
    expect(Math.max(...r.ledger.map((row) => row.socPct))).toBeLessThanOrEqual(100);
  });
});

describe('rules of thumb (common practice)', () => {
  it('when 1 kW of flat panels sits at 45° N on a clear midsummer day, then a day yields about 5 kWh (4–7 kWh band)', () => {
    const r = simulateTrip(simpleTrip({ solarW: 1000, capacityAh: 2000, initialSocPct: 10 }));
    const available = r.ledger.reduce((s, row) => s + row.solarAvailableWh, 0);
    expect(available).toBeGreaterThan(4000);
    expect(available).toBeLessThan(7000);
  });

  it.each(['clear', 'broken-cloud', 'overcast'] as const)(
    'when the sky is %s, then deep forest harvests about 5 % of an open site (3.5–6.5 %)',
    (sky) => {
      const day = (exposure: 'open' | 'deep-forest'): number =>
        simulateTrip(simpleTrip({ solarW: 1000, capacityAh: 2000, initialSocPct: 10, exposure, sky })).ledger.reduce(
          (s, row) => s + row.solarAvailableWh,
          0,
        );
      const share = day('deep-forest') / day('open');
      expect(share).toBeGreaterThan(0.035);
      expect(share).toBeLessThan(0.065);
    },
  );

  it('when the sky worsens level by level, then the day harvest falls', () => {
    const day = (sky: 'clear' | 'hazy' | 'broken-cloud' | 'overcast'): number =>
      simulateTrip(simpleTrip({ solarW: 1000, capacityAh: 2000, initialSocPct: 10, sky })).headline.solarUsedWh;
    expect(day('clear')).toBeGreaterThan(day('hazy'));
    expect(day('hazy')).toBeGreaterThan(day('broken-cloud'));
    expect(day('broken-cloud')).toBeGreaterThan(day('overcast'));
  });
});

describe('time zones and daylight saving', () => {
  const autumn = (zone: string) =>
    simpleTrip({
      zone,
      arrive: '2027-10-30T12:00+01:00',
      depart: '2027-11-01T12:00Z',
      appliances: [
        {
          id: 'lamp',
          name: 'Lamp',
          circuit: 'dc',
          runningW: 60,
          schedule: {
            kind: 'routine',
            windows: [{ days: { kind: 'all' }, startHour: 1, startMinute: 0, minutes: 60 }],
          },
        },
      ],
    });

  it('when the clocks go back inside a trip, then no hour is dropped or doubled in UTC', () => {
    const r = simulateTrip(autumn('Europe/London'));
    expect(r.ledger).toHaveLength(49);
    for (let i = 1; i < r.ledger.length; i++) {
      expect(Date.parse(r.ledger[i]?.utc ?? '') - Date.parse(r.ledger[i - 1]?.utc ?? '')).toBe(3_600_000);
    }
    expect(r.ledger.map((row) => row.local)).toContain('2027-10-31T01:00+01:00');
    expect(r.ledger.map((row) => row.local)).toContain('2027-10-31T01:00+00:00');
  });

  it('when a routine runs 01:00–02:00 local and 01:00 happens twice, then it runs in both local 01:00 hours', () => {
    const r = simulateTrip(autumn('Europe/London'));
    const lampHours = r.ledger.filter((row) => row.dcLoadWh > 0).map((row) => row.local);
    expect(lampHours).toEqual(['2027-10-31T01:00+01:00', '2027-10-31T01:00+00:00', '2027-11-01T01:00+00:00']);
  });
});

describe('demo trips', () => {
  const highland = simulateTrip(highlandLoop);
  const desert = simulateTrip(desertSpringLoop);

  it('when the Highland loop is simulated, then every day has a sheet and the band brackets the plan', () => {
    expect(highland.days.map((d) => d.date)).toEqual([
      '2027-09-12',
      '2027-09-13',
      '2027-09-14',
      '2027-09-15',
      '2027-09-16',
      '2027-09-17',
      '2027-09-18',
      '2027-09-19',
    ]);
    expect(highland.band?.better.lowestSocPct).toBeGreaterThanOrEqual(highland.headline.lowestSocPct);
    expect(highland.band?.worse.lowestSocPct).toBeLessThanOrEqual(highland.headline.lowestSocPct);
  });

  it('when the caravan sits in the pinewood, then that full day harvests a small fraction of an open day', () => {
    const forest = highland.days.find((d) => d.date === '2027-09-15');
    const open = highland.days.find((d) => d.date === '2027-09-18');
    expect(forest?.stopIndexes).toEqual([1]);
    expect(open?.stopIndexes).toEqual([3]);
    expect((forest?.solarAvailableWh ?? 0) / (open?.solarAvailableWh ?? 1)).toBeLessThan(0.1);
  });

  it('when the caravan has no hookup after the loch, then flags name fixes with numbers: generator hours at the rally field or a hookup night', () => {
    const shortfalls = highland.flags.filter((f) => f.kind === 'below-reserve' || f.kind === 'energy-short');
    expect(shortfalls.length).toBeGreaterThan(0);
    const fixes = withFixes(shortfalls, checkFixes(highlandLoop)).flatMap((f) => f.fixes);
    const gen = fixes.find((f) => f.kind === 'add-generator-hours' && f.params.stopIndex === 3);
    expect(gen?.text).toMatch(/^run .* \d+ h \d\d min a day, \d\d:\d\d–20:00, at stop 4 \(allowed 09:00–20:00\)/);
    expect(fixes.some((f) => f.kind === 'add-hookup-night')).toBe(true);
  });

  it('when the caravan books hookup nights as the headroom finder says, then the reserve holds', () => {
    const head = findHeadroom(highlandLoop);
    const hookup = head.levers.find((l) => l.lever === 'hookup');
    expect(head.needed).toBe(true);
    expect(hookup?.status).toBe('found');
    expect(hookup?.resultingLowestSocPct).toBeGreaterThanOrEqual(head.reservePct);
  });

  it('when the trailer runs its roof air conditioning, then use peaks on hot afternoons and the generator burns propane', () => {
    const afternoon = desert.ledger.filter((r) => r.local.slice(11, 13) === '16' && r.where.kind === 'stop');
    const morning = desert.ledger.filter((r) => r.local.slice(11, 13) === '08' && r.where.kind === 'stop');
    const avg = (rows: typeof desert.ledger): number => rows.reduce((s, r) => s + r.acLoadWh, 0) / rows.length;
    expect(avg(afternoon)).toBeGreaterThan(avg(morning) + 300);
    expect(desert.headline.generatorFuel?.fuel).toBe('propane');
    expect(desert.headline.propaneLeftKg).toBeLessThan(desert.headline.propaneStartKg);
    expect(desert.flags.some((f) => f.kind === 'high-dc-current')).toBe(true);
  });

  it('when a generator runs by rule, then it only runs inside the stop’s allowed local hours', () => {
    for (const row of desert.ledger) {
      if (row.generatorH === 0) continue;
      const hour = Number(row.local.slice(11, 13));
      expect(hour).toBeGreaterThanOrEqual(8);
      expect(hour).toBeLessThan(20);
    }
  });
});

describe('headroom finder', () => {
  it('when the plan already holds the reserve, then it says none is needed', () => {
    const r = findHeadroom(simpleTrip({ solarW: 400, appliances: [constantLoad('load', 'dc', 10)] }));
    expect(r.needed).toBe(false);
    expect(r.levers.every((l) => l.status === 'not-needed')).toBe(true);
  });

  it('when a night load drains the battery, then more battery fixes it at the smallest size and solar cannot', () => {
    const input = simpleTrip({ capacityAh: 50, solarW: 0, appliances: [constantLoad('load', 'dc', 30)] });
    const r = findHeadroom(input);
    const battery = r.levers.find((l) => l.lever === 'battery');
    expect(battery?.status).toBe('found');
    expect(battery?.resultingLowestSocPct).toBeGreaterThanOrEqual(20);
    const less = simulateTrip({
      ...input,
      rig: { ...input.rig, battery: { ...input.rig.battery, capacityAh: 50 + (battery?.amount ?? 0) - 10 } },
    });
    expect(less.headline.lowestSocPct).toBeLessThan(20);
    expect(r.levers.find((l) => l.lever === 'solar')?.status).toBe('not-applicable');
  });
});

describe('other flags', () => {
  it('when a lithium battery sits below 0 °C with solar to spare, then charging is blocked and flagged', () => {
    const r = simulateTrip(simpleTrip({ solarW: 400, initialSocPct: 50, lowC: -10, highC: -2 }));
    expect(r.flags.some((f) => f.kind === 'cold-charge-blocked')).toBe(true);
    expect(r.headline.solarUsedWh).toBe(0);
  });

  it('when a 3 kW heater burns through the propane, then the run-out is flagged with the extra kilograms', () => {
    const input = simpleTrip({
      appliances: [
        { id: 'heat', name: 'Heater', circuit: 'fuel', runningW: 0, heatInputW: 3000, schedule: { kind: 'always' } },
      ],
    });
    const planned = { ...input, rig: { ...input.rig, propaneTanks: [{ propaneKg: 2 }] } };
    const r = simulateTrip(planned);
    const flag = withFixes(r.flags, checkFixes(planned)).find((f) => f.kind === 'propane-out');
    expect(flag?.fixes[0]?.params.extraKg).toBeCloseTo((3 * 24) / 14.07 - 2, 0);
  });
});
