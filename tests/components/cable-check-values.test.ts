import { describe, expect, it } from 'vitest';
import {
  checkForm,
  equivalentText,
  runLength,
  runVerdict,
  sizeText,
  sizeWithEquivalent,
} from '@/components/rig/dc-run-values';
import { DEMO_TRIPS } from '@/shared/engine';
import { dcLoadsFromAppliances } from '@/shared/engine/dc-run-defaults';
import { applianceSchema } from '@/shared/schemas/appliance';
import { rigSchema } from '@/shared/schemas/rig';

const highland = rigSchema.parse(DEMO_TRIPS.highlandLoop.rig);
const desert = rigSchema.parse(DEMO_TRIPS.desertSpringLoop.rig);

describe('sizes and lengths in the user’s units', () => {
  it('when a metric size is shown, then its AWG equivalent is beside it, and the other way round', () => {
    expect(sizeWithEquivalent({ unit: 'mm2', mm2: 70 })).toBe('70 mm² (≈ 2/0 AWG)');
    expect(sizeText({ unit: 'awg', awg: '4/0' })).toBe('4/0 AWG');
    expect(equivalentText({ unit: 'awg', awg: '4/0' })).toBe('107.2 mm²');
  });

  it('when a run length is shown in US units, then metres read as feet and go back as metres', () => {
    const ft = runLength('us');
    expect(ft.unit).toBe('ft');
    expect(ft.show(3.048)).toBe(10);
    expect(ft.store(10)).toBeCloseTo(3.048, 3);
    expect(runLength('metric').show(1.2)).toBe(1.2);
  });
});

describe('the form’s live check', () => {
  it('when the rig has no runs, then suggestions in the user’s family come from its parts and loads', () => {
    const loads = dcLoadsFromAppliances(
      (DEMO_TRIPS.highlandLoop.appliances ?? []).map((a) => applianceSchema.parse(a)),
    );
    const check = checkForm({ ...highland, dcWiring: { basis: 'abyc-e11', runs: [] } }, 'us', loads);
    expect(check.ready && check.suggested).toBe(true);
    if (!check.ready) return;
    expect(check.suggestions.length).toBeGreaterThan(4);
    expect(check.suggestions.every((c) => c.run.size.unit === 'awg')).toBe(true);
    expect(check.suggestions.some((c) => c.run.kind === 'dc-load')).toBe(true);
  });

  it('when one run is half typed, then it is set aside and the others are still checked in place', () => {
    const runs = [...highland.dcWiring.runs];
    const broken = { ...runs[1], lengthM: null };
    const check = checkForm(
      { ...highland, dcWiring: { basis: 'abyc-e11', runs: [runs[0], broken, runs[2]] } },
      'metric',
      [],
    );
    expect(check.ready).toBe(true);
    if (!check.ready) return;
    expect(check.entered[0]?.run.name).toBe(runs[0]?.name);
    expect(check.entered[1]).toBeNull();
    expect(check.entered[2]?.run.name).toBe(runs[2]?.name);
  });

  it('when the battery is half typed, then nothing is checked (every current comes from the rig)', () => {
    expect(checkForm({ ...highland, battery: { ...highland.battery, nominalV: null } }, 'metric', [])).toEqual({
      ready: false,
    });
  });
});

describe('plain verdicts', () => {
  const checkOf = (rig: typeof highland, name: string) => {
    const check = checkForm(rig, 'metric', []);
    if (!check.ready) throw new Error('not ready');
    const found = check.entered.find((c) => c?.run.name === name);
    if (!found) throw new Error(`no run ${name}`);
    return { found, basis: check.basis };
  };

  it('when a run carries its current but loses too much voltage, then the verdict says both, and the size that passes', () => {
    const { found, basis } = checkOf(highland, 'Roof array to MPPT');
    const verdict = runVerdict(found, basis, 'metric');
    expect(verdict.tone).toBe('fail');
    expect(verdict.headline).toBe('Fails: loses too much voltage');
    expect(verdict.lines[0]).toMatch(
      /^It carries the current \(good for 55 A\), but it loses 5\.7 % .* over 6 m .* limit .* 3 %/,
    );
    expect(verdict.lines[1]).toBe('Smallest that passes: 16 mm² (≈ 6 AWG).');
  });

  it('when a run passes, then the verdict says what it carries, its drop and its fuse', () => {
    const { found, basis } = checkOf(desert, 'Battery to inverter');
    const verdict = runVerdict(found, basis, 'us');
    expect(verdict.tone).toBe('pass');
    expect(verdict.lines[0]).toBe(
      'Passes: it carries 298 A (good for 445 A) and loses 1.2 % of the voltage (limit 3 %); the 400 A fuse protects it.',
    );
    expect(verdict.lines.some((l) => l.startsWith('Start-ups draw about'))).toBe(true);
  });

  it('when the inverter is taken off the rig, then its run says the current is unknown and why', () => {
    const { found, basis } = checkOf({ ...highland, inverter: null }, 'Battery to inverter');
    const verdict = runVerdict(found, basis, 'metric');
    expect(verdict.tone).toBe('unknown');
    expect(verdict.lines[0]).toContain('no inverter');
  });

  it('when NFPA 70 is chosen for a 3,000 W inverter on 12 V, then no single conductor passes and the verdict says so', () => {
    const rig = { ...desert, dcWiring: { ...desert.dcWiring, basis: 'nfpa70' as const } };
    const { found, basis } = checkOf(rig, 'Battery to inverter');
    const verdict = runVerdict(found, basis, 'us');
    expect(verdict.headline).toContain('too thin for the current');
    expect(verdict.lines.some((l) => l.startsWith('No single conductor up to 4/0 AWG passes here'))).toBe(true);
  });

  it('when a conductor carries the current but the fuse on sale is over its limit, then the verdict names both figures', () => {
    // 6 AWG at 105 °C on NFPA 70 is read at 90 °C: 75 A. 125 % of 60 A is 75 A, and the next rating on sale is 80 A.
    const rig = { ...desert, dcWiring: { ...desert.dcWiring, basis: 'nfpa70' as const } };
    const { found, basis } = checkOf(rig, 'Controller to battery');
    const verdict = runVerdict(found, basis, 'us');
    expect(verdict.lines[0]).toBe(
      'No fuse on sale fits: the smallest at or above 125 % of 60 A (75 A) is 80 A, more than this cable may be protected by (75 A).',
    );
  });
});
