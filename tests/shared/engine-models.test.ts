// Every model against the published check values of CHECK-VALUES.md. Confidence marks copied: C confirmed,
// S secondary copy, M from memory.
import { describe, expect, it } from 'vitest';
import {
  acceptanceLimitShare,
  CHEMISTRY,
  cooperDeclinationDeg,
  cosIncidence,
  dcCurrentA,
  DIESEL_KWH_PER_GAL,
  erbs,
  erbsDiffuseFraction,
  extraterrestrialW,
  groundReflected,
  haurwitzGhi,
  hayDaviesSkyDiffuse,
  ineichenPerez,
  isotropicSkyDiffuse,
  noctCellTempC,
  peukertFactor,
  peukertRuntimeH,
  PETROL_KWH_PER_GAL,
  PROPANE_KWH_PER_GAL,
  PROPANE_KWH_PER_KG,
  pvDcPowerW,
  spencerFactor,
  sunFromHourAngle,
  sunPosition,
  KG_PER_LB,
  PROPANE_LB_PER_GAL,
  skyViewFromHorizon,
  resolveExposure,
  beamFactor,
  ambientC,
} from '@/shared/engine';

const RAD = Math.PI / 180;

describe('sun position (suncalc) against the NREL SPA example', () => {
  // Reda & Andreas, NREL SPA spa_tester.c; pvlib test_spa.py — C. 2003-10-17 12:30:30 at UTC−7.
  const ms = Date.UTC(2003, 9, 17, 19, 30, 30);
  const p = sunPosition(ms, 39.742476, -105.1786);

  it('when the SPA example instant is used, then the zenith is within 0.01° of 50.111622° (C)', () => {
    expect(Math.abs(90 - p.altitudeDeg - 50.111622)).toBeLessThan(0.01);
  });
  it('when the SPA example instant is used, then the azimuth is within 0.01° of 194.340241° (C)', () => {
    expect(Math.abs(p.azimuthDeg - 194.340241)).toBeLessThan(0.01);
  });
  it('when the next day is used, then zenith and azimuth match pvlib 50.478260° / 194.311132° within 0.01° (C)', () => {
    const q = sunPosition(ms + 86_400_000, 39.742476, -105.1786);
    expect(Math.abs(90 - q.altitudeDeg - 50.47826)).toBeLessThan(0.01);
    expect(Math.abs(q.azimuthDeg - 194.311132)).toBeLessThan(0.01);
  });
});

describe('clear sky', () => {
  // Haurwitz (1945); pvlib test_clearsky.py::test_haurwitz — C.
  it.each([
    [5, 48.6299],
    [10, 135.7417],
    [30, 487.8941],
    [50, 778.7667],
    [90, 1035.092],
  ])('when the sun is %d° high, then Haurwitz GHI is %f W/m² (pvlib, C)', (elev, ghi) => {
    expect(haurwitzGhi(90 - elev)).toBeCloseTo(ghi, 3);
  });
  it('when the sun is below the horizon, then Haurwitz gives 0', () => {
    expect(haurwitzGhi(95)).toBe(0);
  });
  // Ineichen & Perez (2002); pvlib test_clearsky.py — C.
  it('when z 10°, AM 1, TL 3, h 0, then Ineichen–Perez gives GHI 1038.159219, DNI 942.208186, DHI 110.265293 (pvlib, C)', () => {
    const r = ineichenPerez({ zenithDeg: 10, airMassAbsolute: 1, linkeTurbidity: 3, elevationM: 0 });
    expect(r.ghi).toBeCloseTo(1038.159219, 4);
    expect(r.dni).toBeCloseTo(942.208186, 4);
    expect(r.dhi).toBeCloseTo(110.265293, 4);
  });
});

describe('extraterrestrial irradiance (Spencer 1971)', () => {
  it('when day 300 and solar constant 1366.1, then 1383.636 W/m² (pvlib test_get_extra_radiation, C)', () => {
    expect(extraterrestrialW(300, 1366.1)).toBeCloseTo(1383.636, 2);
  });
  it('when perihelion (early January) vs aphelion (early July), then the factor is about 1.034 vs 0.967 (C, Spencer)', () => {
    expect(spencerFactor(3)).toBeCloseTo(1.035, 3);
    expect(spencerFactor(185)).toBeCloseTo(0.9666, 3);
  });
});

describe('Erbs decomposition', () => {
  it('when GHI 1000, z 10°, day 180, then kt 0.7689, DNI 842.358, DHI 170.439 (pvlib test_erbs_all_scalar, C)', () => {
    // pvlib's day-angle arithmetic differs from ours in the fifth digit of dni_extra; agreement is to 0.03 W/m².
    const r = erbs(1000, 10, extraterrestrialW(180, 1366.1));
    expect(r.kt).toBeCloseTo(0.76891947, 4);
    expect(Math.abs(r.dni - 842.358014)).toBeLessThan(0.05);
    expect(Math.abs(r.dhi - 170.439297)).toBeLessThan(0.05);
  });
  it.each([
    [0.1, 1 - 0.009],
    [0.9, 0.165],
  ])('when kt is %f, then the diffuse fraction follows the outer branches (Erbs et al. 1982, C)', (kt, df) => {
    expect(erbsDiffuseFraction(kt)).toBeCloseTo(df, 6);
  });
});

describe('transposition', () => {
  it('when β 40° and DHI 100, then isotropic sky diffuse is 88.302222 (Liu & Jordan; pvlib test_isotropic_float, C)', () => {
    expect(isotropicSkyDiffuse(100, 40)).toBeCloseTo(88.302222, 5);
  });
  it('when β 40°, GHI 900, ρ 0.25, then ground-reflected is 26.32 (pvlib test_get_ground_diffuse_simple_float, C)', () => {
    expect(groundReflected(900, 0.25, 40)).toBeCloseTo(26.32, 4);
  });
  it('when the pvlib Hay–Davies case is used, then sky diffuse is 102.9949 (Hay & Davies 1980; pvlib test_haydavies, C)', () => {
    const v = hayDaviesSkyDiffuse({
      dhi: 118.458,
      dni: 939.955,
      dniExtra: 1321.166,
      zenithDeg: 10.564,
      sunAzDeg: 144.766,
      tiltDeg: 40,
      surfaceAzDeg: 180,
    });
    expect(v).toBeCloseTo(102.9949, 2);
  });
  it('when Madison 13 Feb 10:30 solar time, β 45°, 15° west of south, then θ ≈ 35° (Duffie & Beckman Example 1.6.1, C)', () => {
    const s = sunFromHourAngle(43, cooperDeclinationDeg(44), -22.5);
    const theta = Math.acos(cosIncidence(s.zenithDeg, s.azimuthDeg, 45, 195)) / RAD;
    expect(cooperDeclinationDeg(44)).toBeCloseTo(-14, 0);
    expect(Math.abs(theta - 35.0)).toBeLessThan(0.3); // the textbook rounds δ to −14° and θ to 35.0°
  });
});

describe('PV module and controller', () => {
  it('when G 1000, Ta 30 °C, NOCT 50 °C, then the cell is at 67.5 °C (Ross 1980; pvlib test_ross, C)', () => {
    expect(noctCellTempC(30, 1000, 50)).toBeCloseTo(67.5, 9);
  });
  it('when 100 W at 900 W/m², 30 °C, γ −0.003/°C, then 88.65 W (pvlib test_pvwatts_dc_scalars, C)', () => {
    expect(pvDcPowerW(100, 900, 30, -0.003, 1)).toBeCloseTo(88.65, 9);
  });
});

describe('fuel heating values (CHECK-VALUES §6)', () => {
  it('when propane is 91,452 Btu/gal, then it holds 26.80 kWh/gal (US EIA, C)', () => {
    expect(PROPANE_KWH_PER_GAL).toBeCloseTo(26.8, 2);
  });
  it('when 4.2 lb/gal, then propane holds about 14.0 kWh/kg and 6.32 kWh/lb (LP-gas tables, S)', () => {
    expect(PROPANE_KWH_PER_KG).toBeCloseTo(14.07, 1);
    expect(PROPANE_KWH_PER_GAL / PROPANE_LB_PER_GAL).toBeCloseTo(6.38, 1);
  });
  it('when a 20 lb cylinder is full, then it holds about 126 kWh (computed, C)', () => {
    expect(20 * KG_PER_LB * PROPANE_KWH_PER_KG).toBeCloseTo(127.6, 0);
  });
  it('when petrol and diesel, then 35.25 and 40.26 kWh/gal (US EIA, C)', () => {
    expect(PETROL_KWH_PER_GAL).toBeCloseTo(35.25, 2);
    expect(DIESEL_KWH_PER_GAL).toBeCloseTo(40.26, 2);
  });
});

describe('battery', () => {
  it('when 100 Ah rated at 20 h, k 1.2, 10 A, then Peukert gives 8.71 h (Peukert 1897; arithmetic, C)', () => {
    expect(peukertRuntimeH(100, 20, 1.2, 10)).toBeCloseTo(8.71, 2);
  });
  it('when the same discharge is walked with the Peukert factor, then the run time also comes to 8.71 h (C)', () => {
    expect(100 / (10 * peukertFactor(10, 100, 1.2))).toBeCloseTo(8.71, 2);
  });
  it('when below the 20-hour current, then no Peukert bonus is credited', () => {
    expect(peukertFactor(2, 100, 1.25)).toBe(1);
  });
  it('when lead-acid and LiFePO4 presets, then round trips sit in 78–85 % and 92–98 %, depth 50 % vs 80 % (common practice, S)', () => {
    const rt = (c: keyof typeof CHEMISTRY): number => CHEMISTRY[c].chargeEfficiency * CHEMISTRY[c].dischargeEfficiency;
    expect(rt('agm')).toBeGreaterThanOrEqual(0.78);
    expect(rt('agm')).toBeLessThanOrEqual(0.85);
    expect(rt('flooded')).toBeGreaterThanOrEqual(0.78);
    expect(rt('flooded')).toBeLessThanOrEqual(0.85);
    expect(rt('lifepo4')).toBeGreaterThanOrEqual(0.92);
    expect(rt('lifepo4')).toBeLessThanOrEqual(0.98);
    expect(CHEMISTRY.agm.recommendedDodPct).toBe(50);
  });
  it('when the battery is fuller, then it never ends a charging step emptier (acceptance is monotone)', () => {
    for (const chem of Object.values(CHEMISTRY)) {
      let prev = -1;
      for (let soc = 0; soc <= 1; soc += 0.01) {
        const end = soc + acceptanceLimitShare(soc, 1, chem);
        expect(end).toBeGreaterThanOrEqual(prev - 1e-12);
        expect(end).toBeLessThanOrEqual(1 + 1e-12);
        prev = end;
      }
    }
  });
});

describe('trade rules of thumb', () => {
  it('when a 3000 W load runs on a 12 V bank, then it draws about 250 A (common practice)', () => {
    expect(dcCurrentA(3000, 12)).toBe(250);
  });
});

describe('site exposure and temperature', () => {
  it('when the horizon is 60° all round, then a flat panel sees cos²60° = 25 % of the sky (isotropic sky view)', () => {
    expect(skyViewFromHorizon([60, 60, 60, 60])).toBeCloseTo(0.25, 9);
  });
  it('when the sun is below a custom horizon sector, then only the canopy share of the beam arrives', () => {
    const e = resolveExposure({ kind: 'custom', horizonDeg: [0, 0, 40, 0], canopyTransmittance: 0.3 });
    expect(beamFactor(e, 30, 180)).toBe(0.3);
    expect(beamFactor(e, 30, 90)).toBe(1);
  });
  it('when the curve runs from 8 to 16 °C, then it bottoms at 03:00 and peaks at 15:00', () => {
    expect(ambientC(8, 16, 3)).toBeCloseTo(8, 9);
    expect(ambientC(8, 16, 15)).toBeCloseTo(16, 9);
  });
});
