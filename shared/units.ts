// Display units. The engine works in W, Wh, °C, kg, L, m, m² and km; US display uses °F, lb, US gal, ft, ft² and mi.
export type UnitSystem = 'metric' | 'us';
export type Quantity = 'temperature' | 'mass' | 'volume' | 'length' | 'area' | 'distance' | 'heatRate';

const LB_PER_KG = 1 / 0.45359237;
const L_PER_GAL = 3.785411784;
const M_PER_FT = 0.3048;
const KM_PER_MI = 1.609344;
const BTU_PER_H_PER_W = 3.41214;

export const cToF = (c: number): number => (c * 9) / 5 + 32;
export const fToC = (f: number): number => ((f - 32) * 5) / 9;
export const kgToLb = (kg: number): number => kg * LB_PER_KG;
export const lbToKg = (lb: number): number => lb / LB_PER_KG;
export const litresToGal = (l: number): number => l / L_PER_GAL;
export const galToLitres = (gal: number): number => gal * L_PER_GAL;
export const metresToFeet = (m: number): number => m / M_PER_FT;
export const feetToMetres = (ft: number): number => ft * M_PER_FT;
export const squareMetresToSquareFeet = (m2: number): number => m2 / (M_PER_FT * M_PER_FT);
export const squareFeetToSquareMetres = (ft2: number): number => ft2 * M_PER_FT * M_PER_FT;
export const kmToMiles = (km: number): number => km / KM_PER_MI;
export const milesToKm = (mi: number): number => mi * KM_PER_MI;
export const wattsToBtuPerH = (w: number): number => w * BTU_PER_H_PER_W;
export const btuPerHToWatts = (btu: number): number => btu / BTU_PER_H_PER_W;

type Conversion = { metric: string; us: string; toUs: (v: number) => number; fromUs: (v: number) => number };

export const UNIT_TABLE: Readonly<Record<Quantity, Conversion>> = {
  temperature: { metric: '°C', us: '°F', toUs: cToF, fromUs: fToC },
  mass: { metric: 'kg', us: 'lb', toUs: kgToLb, fromUs: lbToKg },
  volume: { metric: 'L', us: 'gal', toUs: litresToGal, fromUs: galToLitres },
  length: { metric: 'm', us: 'ft', toUs: metresToFeet, fromUs: feetToMetres },
  area: { metric: 'm²', us: 'ft²', toUs: squareMetresToSquareFeet, fromUs: squareFeetToSquareMetres },
  distance: { metric: 'km', us: 'mi', toUs: kmToMiles, fromUs: milesToKm },
  heatRate: { metric: 'W', us: 'Btu/h', toUs: wattsToBtuPerH, fromUs: btuPerHToWatts },
};

/** An internal (metric) value shown in the chosen system, with its unit label. */
export function toDisplay(value: number, quantity: Quantity, system: UnitSystem): { value: number; unit: string } {
  const c = UNIT_TABLE[quantity];
  return system === 'us' ? { value: c.toUs(value), unit: c.us } : { value, unit: c.metric };
}

/** A value typed in the chosen system, converted to the internal (metric) unit. */
export function fromDisplay(value: number, quantity: Quantity, system: UnitSystem): number {
  return system === 'us' ? UNIT_TABLE[quantity].fromUs(value) : value;
}
