// Generator fuel: the linear fuel curve F = F0·P_rated + F1·P_out (Skarstein & Uhlen 1989, the usual generic
// generator curve), kept here in fuel energy (higher heating value, kWh per hour) so one form serves every fuel:
// a running generator burns F0 per rated kW whatever it delivers, plus F1 per kWh it delivers.
//
// Coefficients per fuel, and their basis:
// - diesel: Skarstein & Uhlen's F0 = 0.08415 L/h per rated kW and F1 = 0.246 L/kWh (CHECK-VALUES §6, from memory),
//   at 40.26 kWh per US gallon (US EIA): about 28.5 % fuel-to-electric at rated load.
// - petrol and propane (small spark-ignition inverter generators): F0 = 0.72 and F1 = 3.3 kWh of fuel energy, set so
//   that rated load gives 24.9 % and three-quarter load 23.5 % (the trade's 20–25 % at good load, common practice),
//   falling to about 16 % at a quarter load. The idle share (F0/F1 ≈ 0.22) is below the diesel set's (0.34) because
//   an inverter generator throttles its engine down with the load. The two fuels share the figures: their
//   efficiencies on the higher heating value differ by less than the spread between units.
import type { FuelKind, FuelModel } from '../schemas/rig';
import { DIESEL_KWH_PER_GAL, kwhPerFuelUnit, LITRES_PER_US_GAL } from './fuel';

/** F0 in kWh of fuel per hour per rated kW, F1 in kWh of fuel per kWh delivered. */
export type FuelCurve = { f0: number; f1: number };

const DIESEL_KWH_PER_L = DIESEL_KWH_PER_GAL / LITRES_PER_US_GAL;
const SPARK_IGNITION: FuelCurve = { f0: 0.72, f1: 3.3 };

export const FUEL_CURVES: Readonly<Record<FuelKind, FuelCurve>> = {
  diesel: { f0: 0.08415 * DIESEL_KWH_PER_L, f1: 0.246 * DIESEL_KWH_PER_L },
  petrol: SPARK_IGNITION,
  propane: SPARK_IGNITION,
};

/** Continuous output a generator is planned at, as a share of its rating (common practice: about 90 %). */
export const CONTINUOUS_SHARE = 0.9;

/** The fuel model of a generator of `ratedW` on `fuel`: the constant term is F0 × the rating. */
export function defaultFuelModel(ratedW: number, fuel: FuelKind): FuelModel {
  const c = FUEL_CURVES[fuel];
  return { idleFuelKwhPerH: c.f0 * (ratedW / 1000), fuelKwhPerKwhOut: c.f1 };
}

/** Fuel burned running for `hours` delivering outWh, in the fuel's unit (kg propane, L petrol/diesel). */
export function fuelUse(model: FuelModel, fuel: FuelKind): (hours: number, outWh: number) => number {
  const kwhPerUnit = kwhPerFuelUnit(fuel);
  return (hours, outWh) => (model.idleFuelKwhPerH * hours + model.fuelKwhPerKwhOut * (outWh / 1000)) / kwhPerUnit;
}

export function generatorFuel(model: FuelModel, fuel: FuelKind, hours: number, outWh: number): number {
  return fuelUse(model, fuel)(hours, outWh);
}

/** Fuel-to-electric efficiency at a steady load. */
export function generatorEfficiency(model: FuelModel, loadW: number): number {
  const fuelKwhPerH = model.idleFuelKwhPerH + model.fuelKwhPerKwhOut * (loadW / 1000);
  return loadW / 1000 / fuelKwhPerH;
}
