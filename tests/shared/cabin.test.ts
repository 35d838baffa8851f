// The cabin heat balance: UA·ΔT plus solar and internal gains, against closed-form steady states (the heat-balance
// form of ASHRAE Handbook — Fundamentals; CHECK-VALUES §11, C) and the trade's typical figures (§11, M).
import { describe, expect, it } from 'vitest';
import {
  cabinModel,
  COOLING_COP,
  envelopeAreaM2,
  FUEL_HEATER_EFFICIENCY,
  INSULATION_U,
  PERSON_W,
  PROPANE_KWH_PER_KG,
  simulateTrip,
} from '@/shared/engine';
import type { ApplianceInput, EngineInputDraft } from '@/shared/schemas';
import { cabinSchema, type CabinInput } from '@/shared/schemas/rig';
import { simpleTrip } from './trip-builder';

describe('envelope (typical values, CHECK-VALUES §11, M)', () => {
  it('when a 6 m caravan has standard insulation, then its UA is within the trade’s 40–80 W/K', () => {
    const ua = cabinModel(cabinSchema.parse({ lengthM: 6 })).ua;
    expect(ua).toBeGreaterThan(40);
    expect(ua).toBeLessThan(80);
  });
  it('when a 5.4 m camper van has standard insulation, then its UA is within the trade’s 25–50 W/K', () => {
    const ua = cabinModel(cabinSchema.parse({ lengthM: 5.4, widthM: 1.9, heightM: 1.9 })).ua;
    expect(ua).toBeGreaterThan(25);
    expect(ua).toBeLessThan(50);
  });
  it('when the insulation improves, then less heat gets through', () => {
    expect(INSULATION_U.basic).toBeGreaterThan(INSULATION_U.standard);
    expect(INSULATION_U.standard).toBeGreaterThan(INSULATION_U['four-season']);
  });
});

/** A polar-night day at 70° N (no sun), the air held at `outC`, one thermostat-run appliance, no one aboard. */
function sunless(outC: number, appliance: ApplianceInput, cabin: CabinInput = { occupants: 0 }): EngineInputDraft {
  const t = simpleTrip({
    lat: 70,
    lon: 20,
    arrive: '2027-12-20T00:00Z',
    depart: '2027-12-21T00:00Z',
    lowC: outC,
    highC: outC,
    inverter: true,
    capacityAh: 1000,
  });
  return { ...t, rig: { ...t.rig, cabin, propaneTanks: [{ propaneKg: 50 }] }, appliances: [appliance] };
}

const furnace: ApplianceInput = {
  id: 'furnace',
  name: 'Furnace',
  circuit: 'fuel',
  runningW: 40,
  heatInputW: 7000,
  schedule: { kind: 'thermostat', mode: 'heating', setPointC: 20 },
};

const airConditioner: ApplianceInput = {
  id: 'ac',
  name: 'Air conditioner',
  circuit: 'ac',
  runningW: 1400,
  schedule: { kind: 'thermostat', mode: 'cooling', setPointC: 25 },
};

describe('steady state (ASHRAE heat-balance form, C)', () => {
  const ua = cabinModel(cabinSchema.parse({ occupants: 0 })).ua;

  it('when it is 0 °C outside with no sun and no one aboard, then the furnace supplies UA·20 K at its efficiency', () => {
    const r = simulateTrip(sunless(0, furnace));
    const heatW = ua * 20;
    const fuelKgPerH = heatW / FUEL_HEATER_EFFICIENCY / 1000 / PROPANE_KWH_PER_KG;
    for (const row of r.ledger) {
      expect(row.propaneBurnedKg).toBeCloseTo(fuelKgPerH, 9);
      expect(row.cabinC).toBeCloseTo(20, 9);
      // The blower runs for the furnace's share of the hour.
      expect(row.dcLoadWh).toBeCloseTo((40 * heatW) / (7000 * FUEL_HEATER_EFFICIENCY), 9);
    }
  });

  it('when two people are aboard, then each one’s 100 W is heat the furnace does not have to give', () => {
    const alone = simulateTrip(sunless(0, furnace)).ledger[3]?.propaneBurnedKg ?? 0;
    const two = simulateTrip(sunless(0, furnace, { occupants: 2 })).ledger[3]?.propaneBurnedKg ?? 0;
    expect((alone - two) * PROPANE_KWH_PER_KG * 1000 * FUEL_HEATER_EFFICIENCY).toBeCloseTo(2 * PERSON_W, 6);
  });

  it('when it is 35 °C outside with no sun, then the air conditioner removes UA·10 K at its COP', () => {
    const r = simulateTrip(sunless(35, airConditioner));
    for (const row of r.ledger) {
      expect(row.acLoadWh).toBeCloseTo((ua * 10) / COOLING_COP, 9);
      expect(row.cabinC).toBeCloseTo(25, 9);
    }
  });

  it('when the heater is too small for the cold, then it runs flat out and the cabin settles below its set point', () => {
    const small: ApplianceInput = { ...furnace, heatInputW: 500 };
    const row = simulateTrip(sunless(-20, small)).ledger[3];
    const delivered = 500 * FUEL_HEATER_EFFICIENCY;
    expect(row?.cabinC).toBeCloseTo(-20 + delivered / ua, 9);
    expect(row?.propaneBurnedKg).toBeCloseTo(0.5 / PROPANE_KWH_PER_KG, 9);
  });

  it('when the cabin is bigger, then its envelope and its heating grow together', () => {
    const big = cabinSchema.parse({ lengthM: 8, occupants: 0 });
    const a = simulateTrip(sunless(0, furnace, { lengthM: 8, occupants: 0 })).ledger[3]?.propaneBurnedKg ?? 0;
    expect(a * PROPANE_KWH_PER_KG * 1000 * FUEL_HEATER_EFFICIENCY).toBeCloseTo(
      INSULATION_U.standard * envelopeAreaM2(big) * 20,
      6,
    );
  });
});

describe('the heat of the sun and a hot afternoon', () => {
  /** A clear April day in the desert (33° N) with the afternoon high given; the air conditioner 13:00–18:00. */
  const afternoon = (highC: number, exposure: 'open' | 'deep-forest' = 'open') => {
    const t = simpleTrip({
      lat: 33.4,
      lon: -113,
      zone: 'America/Phoenix',
      arrive: '2027-04-06T07:00Z',
      depart: '2027-04-07T07:00Z',
      lowC: highC - 18,
      highC,
      inverter: true,
      capacityAh: 1000,
      exposure,
    });
    const ac: ApplianceInput = {
      ...airConditioner,
      schedule: {
        kind: 'thermostat',
        mode: 'cooling',
        setPointC: 27,
        activeWindows: [{ startHour: 13, minutes: 300 }],
      },
    };
    return simulateTrip({ ...t, appliances: [ac] }).ledger.reduce((s, r) => s + r.acLoadWh, 0);
  };

  it('when the afternoon high climbs from 26 to 34 °C, then the cooling energy rises smoothly: each degree adds less than a quarter', () => {
    const days = [26, 27, 28, 29, 30, 31, 32, 33, 34].map((h) => afternoon(h));
    for (let k = 1; k < days.length; k++) {
      expect(days[k]).toBeGreaterThan(days[k - 1] ?? 0);
      expect((days[k] ?? 0) / (days[k - 1] ?? 1)).toBeLessThan(1.25);
    }
    // From 27 to 33 °C it grows by far less than the ×19 a duty ramp on the outside air gave.
    expect((days[7] ?? 0) / (days[1] ?? 1)).toBeLessThan(2);
  });

  it('when the pitch is under deep forest, then the shaded cabin needs less cooling than in the open', () => {
    expect(afternoon(31, 'deep-forest')).toBeLessThan(0.8 * afternoon(31, 'open'));
  });
});
