// Incidence angle losses by Martin & Ruiz (2001) against pvlib's test values (CHECK-VALUES §5a, C). Their effect on a
// day's harvest is checked in solar-chain.test.ts.
import { describe, expect, it } from 'vitest';
import { martinRuizDiffuse, martinRuizIam } from '@/shared/engine';

const RAD = Math.PI / 180;

describe('Martin & Ruiz incidence angle modifier (pvlib test_martin_ruiz, C)', () => {
  it('when a_r 0.16 and θ 45°, then IAM is 0.98986965', () => {
    expect(martinRuizIam(Math.cos(45 * RAD), 0.16)).toBeCloseTo(0.98986965, 8);
  });
  it('when a_r 0.18 and θ 60°, then IAM is 0.9414631', () => {
    expect(martinRuizIam(Math.cos(60 * RAD), 0.18)).toBeCloseTo(0.9414631, 7);
  });
  it('when the light comes at or beyond 90°, then none of it counts', () => {
    expect(martinRuizIam(0)).toBe(0); // cos 90°
    expect(martinRuizIam(-0.2)).toBe(0);
    expect(martinRuizIam(1)).toBeCloseTo(1, 12);
  });
});

describe('Martin & Ruiz diffuse integrals (pvlib test_martin_ruiz_diffuse, C)', () => {
  it('when tilt 30° and a_r 0.16, then sky 0.9549735 and ground 0.7944426', () => {
    const r = martinRuizDiffuse(30, 0.16);
    expect(r.sky).toBeCloseTo(0.9549735, 7);
    expect(r.ground).toBeCloseTo(0.7944426, 7);
  });
  it.each([
    [0, 0.9407678, 0],
    [30, 0.945225, 0.7610849],
    [90, 0.9407678, 0.9407678],
    [120, 0.9055541, 0.9483508],
    [180, 0, 0.9407678],
  ])('when a_r 0.18 and tilt %d°, then sky %f and ground %f', (tilt, sky, ground) => {
    const r = martinRuizDiffuse(tilt, 0.18);
    expect(r.sky).toBeCloseTo(sky, 6); // pvlib lists seven digits, not always rounded
    expect(r.ground).toBeCloseTo(ground, 6);
  });
});
