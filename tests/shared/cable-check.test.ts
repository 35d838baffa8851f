// The cable and fuse check against CHECK-VALUES §8 (DC wire, copper). Confidence marks copied: S secondary copy
// (public transcriptions that agree), M from memory; rules of thumb say "common practice".
import { describe, expect, it } from 'vitest';
import {
  ampacityA,
  checkRun,
  judgeConductor,
  maxProtectionA,
  protectionForA,
  smallestByAmpacity,
  smallestPassing,
  voltageDropV,
  type Installation,
} from '@/shared/engine/cable-check';
import { inverterDrawA, lowBatteryV, runCurrent, type CableRig } from '@/shared/engine/cable-current';
import { areaCmil, awg, inFamily, mm2, nearestAwg, ratingAwg, stepSize } from '@/shared/engine/conductor-size';
import { RESISTANCE_OHM_PER_KFT, tableAmpacityA } from '@/shared/engine/conductor-tables';
import { suggestedDcRuns } from '@/shared/engine/dc-run-defaults';
import { checkDcWiring } from '@/shared/engine/dc-wiring-check';
import { DEMO_TRIPS } from '@/shared/engine';
import { AWG_SIZES, dcRunSchema, type AwgSize, type DcRun, type DcRunInput } from '@/shared/schemas/dc-wiring';
import { rigSchema } from '@/shared/schemas/rig';

const FT = 0.3048;
const ABYC_105: Installation = { basis: 'abyc-e11', insulationC: 105, engineSpace: false, tinned: false };
const NFPA_90: Installation = { basis: 'nfpa70', insulationC: 90, engineSpace: false, tinned: false };

const rig = (over: Partial<CableRig> = {}): CableRig => ({
  battery: { chemistry: 'flooded', capacityAh: 200, nominalV: 12, initialSocPct: 100, heatedSpace: false },
  inverter: null,
  controller: null,
  solarArrays: [],
  vehicleCharger: null,
  ...over,
});
const run = (r: Partial<DcRunInput> & Pick<DcRunInput, 'kind'>): DcRun =>
  dcRunSchema.parse({ name: 'Run', lengthM: 1, size: awg('4/0'), ...r });

describe('conductor tables spot-checked against §8', () => {
  // NFPA 70 Table 310.16 (S): one value per column at each end and in the middle of the table.
  it.each([
    ['14', 60, 15],
    ['14', 75, 20],
    ['14', 90, 25],
    ['6', 60, 55],
    ['6', 75, 65],
    ['6', 90, 75],
    ['1/0', 75, 150],
    ['4/0', 60, 195],
    ['4/0', 75, 230],
    ['4/0', 90, 260],
  ] as const)('when %s AWG has %i °C insulation on NFPA 70, then the table gives %i A (S)', (size, c, a) => {
    expect(tableAmpacityA('nfpa70', size, c)).toBe(a);
  });

  // ABYC E-11 / 33 CFR 183.425, 105 °C, outside engine spaces (S): every size.
  it.each([
    ['14', 35],
    ['12', 45],
    ['10', 60],
    ['8', 80],
    ['6', 120],
    ['4', 160],
    ['3', 180],
    ['2', 210],
    ['1', 245],
    ['1/0', 285],
    ['2/0', 330],
    ['3/0', 385],
    ['4/0', 445],
  ] as const)('when %s AWG is 105 °C cable on ABYC E-11, then it carries %i A (S)', (size, a) => {
    expect(tableAmpacityA('abyc-e11', size, 105)).toBe(a);
  });

  // NFPA 70 Ch. 9 Table 8 (S).
  it.each([
    ['12', 1.98, 2.05],
    ['4', 0.308, 0.321],
    ['4/0', 0.0608, 0.0626],
  ] as const)('when %s AWG is stranded copper, then Table 8 gives %f Ω/kft bare and %f tinned (S)', (size, b, t) => {
    expect(RESISTANCE_OHM_PER_KFT.bare[size]).toBe(b);
    expect(RESISTANCE_OHM_PER_KFT.tinned[size]).toBe(t);
  });

  it('when 105 °C insulation is read on NFPA 70, then the 90 °C column is used (the table has no hotter one)', () => {
    expect(tableAmpacityA('nfpa70', '2/0', 105)).toBe(195);
  });

  it('when sizes grow, then every column of both tables never gives a larger size less current', () => {
    const sizes: readonly AwgSize[] = AWG_SIZES;
    for (const basis of ['abyc-e11', 'nfpa70'] as const)
      for (const c of [60, 75, 90, 105] as const)
        for (let i = 1; i < sizes.length; i++)
          expect(tableAmpacityA(basis, sizes[i] as AwgSize, c)).toBeGreaterThanOrEqual(
            tableAmpacityA(basis, sizes[i - 1] as AwgSize, c),
          );
  });
});

describe('the worked example of §8: 10 A, 21 ft round trip, 12 V, 3 %', () => {
  const demand = { currentA: 10, oneWayM: 10.5 * FT, systemV: 12, dropLimitPct: 3 };

  it('when sized by ABYC E-11, then 12 AWG is the smallest that passes (6,271 CM needed; S)', () => {
    expect(smallestPassing('awg', ABYC_105, demand)).toEqual(awg('12'));
    // 14 AWG (4,110 CM) is under the 6,271 CM the formula asks for, 12 AWG (6,530 CM) is over it.
    expect(judgeConductor(awg('14'), ABYC_105, demand).dropOk).toBe(false);
    expect(judgeConductor(awg('12'), ABYC_105, demand).dropPct).toBeCloseTo((100 * 10.75 * 10 * 21) / 6530 / 12, 6);
  });

  it('when sized by NFPA 70 (Table 8 resistance at 75 °C), then the hotter copper needs 10 AWG', () => {
    // 12 AWG: 1.98 Ω/kft × 21 ft × 10 A = 0.416 V = 3.5 % of 12 V, over the limit.
    expect(voltageDropV(awg('12'), NFPA_90, 10, 10.5 * FT)).toBeCloseTo(0.4158, 3);
    expect(smallestPassing('awg', NFPA_90, demand)).toEqual(awg('10'));
  });

  it('when the copper is tinned, then it drops more than bare by Table 8’s coated/uncoated ratio', () => {
    const bare = voltageDropV(awg('12'), ABYC_105, 10, 10.5 * FT);
    const tinned = voltageDropV(awg('12'), { ...ABYC_105, tinned: true }, 10, 10.5 * FT);
    expect(tinned / bare).toBeCloseTo(2.05 / 1.98, 6);
  });
});

describe('a 3,000 W inverter at 12 V (common practice: about 250 A, 4/0 AWG)', () => {
  it('when the draw is taken at 12 V without losses, then it is 250 A (P ÷ V, common practice)', () => {
    expect(inverterDrawA(3000, 12, 1)).toBeCloseTo(250, 9);
  });

  it('when 250 A is sized by NFPA 70 Table 310.16 at 90 °C, then 4/0 AWG carries it and 3/0 does not (S)', () => {
    expect(smallestByAmpacity('awg', NFPA_90, 250)).toEqual(awg('4/0'));
  });

  it('when the whole run is checked on ABYC E-11 at the inverter’s cut-off, then 4/0 AWG is the smallest that passes', () => {
    // 3000 W ÷ (10.5 V × 0.9) = 317 A; a 400 A fuse (≥ 1.25 × 317) needs 4/0’s 445 A; 3/0’s 385 A is short.
    const r = rig({ inverter: { ratedW: 3000, efficiency: 0.9, idleW: 20, mode: 'on-demand' } });
    const current = runCurrent(run({ kind: 'battery-inverter' }), r, []);
    expect(current.known && current.continuousA).toBeCloseTo(3000 / (10.5 * 0.9), 6);
    const check = checkRun(run({ kind: 'battery-inverter', lengthM: 1.5, size: awg('2/0') }), r, 'abyc-e11', []);
    expect(check.known && check.smallest).toEqual(awg('4/0'));
    expect(check.known && check.conductor.protectionA).toBe(400);
  });

  it('when the same inverter is sized by NFPA 70 Table 310.16, then no single conductor in the table passes', () => {
    const r = rig({ inverter: { ratedW: 3000, efficiency: 0.9, idleW: 20, mode: 'on-demand' } });
    const check = checkRun(run({ kind: 'battery-inverter', insulationC: 90 }), r, 'nfpa70', []);
    expect(check.known && check.smallest).toBeNull();
    expect(check.known && check.problems).toContain('ampacity');
  });
});

describe('verdicts per run', () => {
  const solar = rig({
    solarArrays: [
      {
        name: 'Roof',
        ratedW: 400,
        mounting: 'flat',
        tiltDeg: 0,
        azimuthDeg: 180,
        fit: 'flush',
        noctC: 45,
        gammaPctPerC: -0.4,
        vmpV: 18,
        derate: 0.86,
        portable: false,
      },
    ],
    controller: { kind: 'mppt', maxAmps: 30, efficiency: 0.97 },
  });

  it('when a run carries its current but loses too much voltage, then it fails on drop alone and names a larger size', () => {
    // 400 W ÷ 18 V × 1.25 = 27.8 A over 6 m of 6 mm²: well inside the ampacity, 5.7 % drop against 3 %.
    const check = checkRun(run({ kind: 'array-controller', lengthM: 6, size: mm2(6) }), solar, 'abyc-e11', []);
    expect(check.known).toBe(true);
    if (!check.known) return;
    expect(check.conductor.carries).toBe(true);
    expect(check.problems).toEqual(['drop']);
    expect(check.passes).toBe(false);
    expect(check.conductor.dropPct).toBeGreaterThan(3);
    expect(check.smallest).toEqual(mm2(16));
  });

  it('when the same run is not critical, then the 10 % limit lets it pass', () => {
    const check = checkRun(
      run({ kind: 'array-controller', lengthM: 6, size: mm2(6), critical: false }),
      solar,
      'abyc-e11',
      [],
    );
    expect(check.known && check.passes).toBe(true);
  });

  it('when the fuse is under 125 % of the continuous current, then it is too small; over the ampacity, too large', () => {
    const small = checkRun(
      run({ kind: 'controller-battery', size: awg('8'), protection: { kind: 'fuse', amps: 35 } }),
      solar,
      'abyc-e11',
      [],
    );
    expect(small.known && small.problems).toEqual(['protection-too-small']);
    const large = checkRun(
      run({ kind: 'controller-battery', size: awg('8'), protection: { kind: 'fuse', amps: 100 } }),
      solar,
      'abyc-e11',
      [],
    );
    expect(large.known && large.problems).toEqual(['protection-too-large']);
    const right = checkRun(
      run({ kind: 'controller-battery', size: awg('8'), protection: { kind: 'fuse', amps: 40 } }),
      solar,
      'abyc-e11',
      [],
    );
    expect(right.known && right.passes).toBe(true);
  });

  it('when a battery run has no fuse, then that is a problem; an array run without one is not', () => {
    const battery = checkRun(run({ kind: 'controller-battery', size: awg('8') }), solar, 'abyc-e11', []);
    expect(battery.known && battery.problems).toEqual(['protection-missing']);
    const array = checkRun(run({ kind: 'array-controller', size: awg('8') }), solar, 'abyc-e11', []);
    expect(array.known && array.passes).toBe(true);
    expect(array.known && array.notes).toContain('array-protection-optional');
  });

  it('when a conductor carries the current but no fuse on sale fits between 125 % and its ampacity, then it says so', () => {
    // 40 A continuous → a 50 A fuse; 8 AWG at 60 °C on NFPA 70 is good for exactly 40 A.
    const at: Installation = { ...NFPA_90, insulationC: 60 };
    const verdict = judgeConductor(awg('8'), at, { currentA: 40, oneWayM: 0.5, systemV: 12, dropLimitPct: 3 });
    expect(verdict.carries).toBe(true);
    expect(verdict.protectionA).toBe(50);
    expect(verdict.protectionFits).toBe(false);
  });

  it('when a run lies in an engine space, then its ampacity takes the 50 °C factor (0.86 at 105 °C, M)', () => {
    expect(ampacityA(awg('4'), { ...ABYC_105, engineSpace: true })).toBeCloseTo(160 * 0.86, 9);
  });

  it('when 12 AWG is on NFPA 70, then its protection is capped at 20 A by 240.4(D) (M), not its 30 A', () => {
    expect(maxProtectionA(awg('12'), NFPA_90)).toBe(20);
    expect(maxProtectionA(awg('12'), ABYC_105)).toBe(45);
  });

  it('when the rig lacks the part a run comes from, then the check says which part rather than guessing', () => {
    expect(checkRun(run({ kind: 'battery-inverter' }), rig(), 'abyc-e11', [])).toEqual({
      known: false,
      missing: 'inverter',
    });
    expect(checkRun(run({ kind: 'dc-dc-charger' }), rig(), 'abyc-e11', [])).toEqual({
      known: false,
      missing: 'vehicle-charger',
    });
  });

  it('when the distribution point has no watts of its own, then it carries the load circuits together', () => {
    const loads = [run({ kind: 'dc-load', loadW: 60, surgeW: 180 }), run({ kind: 'dc-load', loadW: 24 })];
    const panel = run({ kind: 'battery-distribution' });
    const current = runCurrent(panel, rig(), [...loads, panel]);
    expect(current.known && current.continuousA).toBeCloseTo(84 / lowBatteryV(12), 9);
    expect(current.known && current.surgeA).toBeCloseTo((84 + 120) / lowBatteryV(12), 9);
  });

  it('when fuses are picked, then they are the next rating on sale at or above 125 % of the current', () => {
    expect(protectionForA(8)).toBe(10);
    expect(protectionForA(24)).toBe(30);
    expect(protectionForA(198.4)).toBe(250);
    expect(protectionForA(900)).toBeNull();
  });
});

describe('metric sizes', () => {
  it('when a metric size is rated, then it takes the largest AWG no larger in area (conservative)', () => {
    // 35 mm² = 69,073 CM: between 2 AWG (66,360) and 1 AWG (83,690).
    expect(ratingAwg(mm2(35))).toBe('2');
    expect(areaCmil(mm2(35))).toBeCloseTo(69_073, -1);
    expect(nearestAwg(mm2(35))).toBe('2');
    expect(nearestAwg(mm2(50))).toBe('1/0');
  });

  it('when a size is moved to the other family, then it becomes the smallest at least as large', () => {
    expect(inFamily(awg('4'), 'mm2')).toEqual(mm2(25));
    expect(inFamily(mm2(25), 'awg')).toEqual(awg('3'));
    expect(stepSize(mm2(120), 1)).toBeNull();
    expect(stepSize(awg('14'), 1)).toEqual(awg('12'));
  });
});

describe('the rig as a whole', () => {
  it('when no runs are entered, then runs are suggested from the rig’s parts, each passing where a size can', () => {
    const parsed = rigSchema.parse({ ...DEMO_TRIPS.highlandLoop.rig, dcWiring: undefined });
    const check = checkDcWiring(parsed, { unit: 'mm2', dcLoads: [{ name: 'Fridge', runningW: 60, surgeW: 180 }] });
    expect(check.suggested).toBe(true);
    expect(check.runs.map((r) => r.run.kind)).toEqual([
      'battery-inverter',
      'controller-battery',
      'array-controller',
      'dc-dc-charger',
      'dc-load',
      'battery-distribution',
    ]);
    expect(check.failing).toBe(0);
    expect(check.runs.every((r) => r.run.size.unit === 'mm2')).toBe(true);
  });

  it('when the suggested runs are checked, then each is a valid run the API would store', () => {
    const parsed = rigSchema.parse(DEMO_TRIPS.desertSpringLoop.rig);
    for (const r of suggestedDcRuns(parsed, 'nfpa70', 'awg', [{ name: 'Fan', runningW: 40 }]))
      expect(dcRunSchema.safeParse(r).success).toBe(true);
  });

  it('when the demo rigs are checked, then each has exactly one run that carries its current but fails on drop', () => {
    for (const trip of Object.values(DEMO_TRIPS)) {
      const check = checkDcWiring(rigSchema.parse(trip.rig), { unit: 'awg' });
      expect(check.suggested).toBe(false);
      const failing = check.runs.filter((r) => r.check.known && !r.check.passes);
      expect(failing).toHaveLength(1);
      expect(failing[0]?.check.known && failing[0].check.problems).toEqual(['drop']);
    }
  });
});
