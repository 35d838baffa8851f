// Generator: linear part-load fuel model, fuel energy = idle + slope × electrical output. The default is
// scaled from one published field measurement of a 1.2 kW petrol inverter generator (0.0739 US gal/h idle,
// 0.127 US gal/kWh; confidence S), expressed in fuel energy so it applies to any fuel.
import type { FuelKind, FuelModel } from '../schemas/rig';
import { kwhPerFuelUnit, PETROL_KWH_PER_GAL } from './fuel';

const REFERENCE_RATED_W = 1200;
const REFERENCE_IDLE_GAL_PER_H = 0.0739;
const REFERENCE_GAL_PER_KWH = 0.127;

/** Continuous output a generator is planned at, as a share of its rating (common practice: about 90 %). */
export const CONTINUOUS_SHARE = 0.9;

export function defaultFuelModel(ratedW: number): FuelModel {
  return {
    idleFuelKwhPerH: REFERENCE_IDLE_GAL_PER_H * PETROL_KWH_PER_GAL * (ratedW / REFERENCE_RATED_W),
    fuelKwhPerKwhOut: REFERENCE_GAL_PER_KWH * PETROL_KWH_PER_GAL,
  };
}

/** Fuel burned running for hours h delivering outWh, in the fuel's unit (kg propane, L petrol/diesel). */
export function generatorFuel(model: FuelModel, fuel: FuelKind, hours: number, outWh: number): number {
  const fuelKwh = model.idleFuelKwhPerH * hours + model.fuelKwhPerKwhOut * (outWh / 1000);
  return fuelKwh / kwhPerFuelUnit(fuel);
}

/** Fuel-to-electric efficiency at a steady load, for the 20–25 % common-practice check. */
export function generatorEfficiency(model: FuelModel, loadW: number): number {
  const fuelKwhPerH = model.idleFuelKwhPerH + model.fuelKwhPerKwhOut * (loadW / 1000);
  return loadW / 1000 / fuelKwhPerH;
}
