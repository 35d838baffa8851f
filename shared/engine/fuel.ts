// Fuel: heating values and unit conversions. 1 kWh = 3412.14 Btu.
// Propane 91,452 Btu/US gal (US EIA, C) at 4.2 lb/US gal (LP-gas tables, S); petrol 120,286 Btu/gal and
// diesel 137,381 Btu/gal (US EIA, C). All higher heating values.
import type { FuelKind } from '../schemas/rig';

export const BTU_PER_KWH = 3412.14;
export const LITRES_PER_US_GAL = 3.785411784;
export const KG_PER_LB = 0.45359237;

export const PROPANE_BTU_PER_GAL = 91_452;
export const PROPANE_LB_PER_GAL = 4.2;
export const PETROL_BTU_PER_GAL = 120_286;
export const DIESEL_BTU_PER_GAL = 137_381;

export const PROPANE_KWH_PER_GAL = PROPANE_BTU_PER_GAL / BTU_PER_KWH;
export const PROPANE_KWH_PER_KG = PROPANE_KWH_PER_GAL / (PROPANE_LB_PER_GAL * KG_PER_LB);
export const PETROL_KWH_PER_GAL = PETROL_BTU_PER_GAL / BTU_PER_KWH;
export const DIESEL_KWH_PER_GAL = DIESEL_BTU_PER_GAL / BTU_PER_KWH;

/** Heating value per unit the fuel is measured in: kg for propane, litres for petrol and diesel. */
export function kwhPerFuelUnit(fuel: FuelKind): number {
  if (fuel === 'propane') return PROPANE_KWH_PER_KG;
  return (fuel === 'petrol' ? PETROL_KWH_PER_GAL : DIESEL_KWH_PER_GAL) / LITRES_PER_US_GAL;
}

export function fuelUnit(fuel: FuelKind): 'kg' | 'L' {
  return fuel === 'propane' ? 'kg' : 'L';
}

/** Propane mass burned by a heat input, kg. */
export function propaneKgFromHeatWh(heatWh: number): number {
  return heatWh / 1000 / PROPANE_KWH_PER_KG;
}
