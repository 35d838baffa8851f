// Generator fuel: the linear fuel curve F = F0·P_rated + F1·P_out (Skarstein & Uhlen 1989; CHECK-VALUES §6, M)
// against the trade's 20–25 % fuel-to-electric at good load (common practice) and the heating values of §6.
import { describe, expect, it } from 'vitest';
import {
  defaultFuelModel,
  DIESEL_KWH_PER_GAL,
  FUEL_CURVES,
  generatorEfficiency,
  generatorFuel,
  PROPANE_KWH_PER_GAL,
  simulateTrip,
} from '@/shared/engine';
import { constantLoad, simpleTrip } from './trip-builder';

const LOADS = [0.25, 0.5, 0.75, 1] as const;

describe('generator fuel curve', () => {
  it.each(['petrol', 'propane'] as const)(
    'when a 2 kW %s generator runs at ¾ and full load, then fuel-to-electric is 20–25 % (common practice)',
    (fuel) => {
      const m = defaultFuelModel(2000, fuel);
      for (const share of [0.75, 1]) {
        const eff = generatorEfficiency(m, 2000 * share);
        expect(eff).toBeGreaterThanOrEqual(0.2);
        expect(eff).toBeLessThanOrEqual(0.25);
      }
    },
  );

  it.each(['petrol', 'propane', 'diesel'] as const)(
    'when a %s generator carries ¼, ½, ¾ and full load, then its efficiency rises with the load (linear curve)',
    (fuel) => {
      const m = defaultFuelModel(2200, fuel);
      const effs = LOADS.map((share) => generatorEfficiency(m, 2200 * share));
      for (let k = 1; k < effs.length; k++) expect(effs[k]).toBeGreaterThan(effs[k - 1] ?? 0);
      // Light load is worse than good load, but no longer a third of it as with a large fixed idle burn.
      expect(effs[0]).toBeGreaterThan(0.5 * (effs[3] ?? 0));
    },
  );

  it('when the diesel curve is Skarstein & Uhlen’s 0.08415 L/h per kW + 0.246 L/kWh, then rated load gives about 28.5 % (§6, M)', () => {
    const litresPerH = 0.08415 * 5 + 0.246 * 5; // a 5 kW set at rated load
    const fuelKwhPerH = (litresPerH * DIESEL_KWH_PER_GAL) / 3.785411784;
    expect(generatorEfficiency(defaultFuelModel(5000, 'diesel'), 5000)).toBeCloseTo(5 / fuelKwhPerH, 9);
    expect(5 / fuelKwhPerH).toBeCloseTo(0.285, 3);
    expect(FUEL_CURVES.diesel.f0 / FUEL_CURVES.diesel.f1).toBeCloseTo(0.08415 / 0.246, 9);
  });

  it('when a 2,200 W propane unit carries 1 kW, then 3.5 US gal of propane gives 18.9–23.6 kWh (20–25 %, common practice; propane 91,452 Btu/gal, US EIA C)', () => {
    const m = defaultFuelModel(2200, 'propane');
    const kgPerH = generatorFuel(m, 'propane', 1, 1000);
    const galPerH = (kgPerH * 14.07) / PROPANE_KWH_PER_GAL; // back from kg (14.07 kWh/kg) to gallons
    const kwhFrom35Gal = 3.5 / galPerH;
    expect(kwhFrom35Gal).toBeGreaterThanOrEqual(18.9);
    expect(kwhFrom35Gal).toBeLessThanOrEqual(23.6);
  });

  it('when the generator covers a steady 1 kW AC load for an hour, then the ledger burns what the curve says', () => {
    const input = simpleTrip({ capacityAh: 100, inverter: true, appliances: [constantLoad('heater', 'ac', 1000)] });
    const r = simulateTrip({
      ...input,
      trip: {
        ...input.trip,
        stops: input.trip.stops.map((s) => ({ ...s, generatorHours: { startHour: 0, endHour: 24 } })),
      },
      rig: {
        ...input.rig,
        shoreCharger: null,
        generator: {
          ratedW: 2200,
          fuel: 'propane',
          mode: { kind: 'routine', windows: [{ startHour: 0, minutes: 1440 }] },
        },
      },
    });
    const hour = r.ledger[5];
    expect(hour?.generatorWh).toBeCloseTo(1000, 6);
    expect(hour?.generatorFuel).toBeCloseTo(generatorFuel(defaultFuelModel(2200, 'propane'), 'propane', 1, 1000), 9);
  });
});
