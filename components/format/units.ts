// Display formatting. The engine works in metric internal units; these turn a value into the user's
// system and split number from unit, because the screens draw numbers big and units small.
import { toDisplay, type Quantity, type UnitSystem } from '@/shared/units';

export type Figure = { value: string; unit: string };

const grouped = (v: number, digits: number): string =>
  v.toLocaleString('en-GB', { minimumFractionDigits: digits, maximumFractionDigits: digits });

/** Wh below 10 kWh stay in Wh (what appliance labels use); larger amounts read better in kWh. */
export function energy(wh: number): Figure {
  const abs = Math.abs(wh);
  if (abs >= 10_000) return { value: grouped(wh / 1000, 1), unit: 'kWh' };
  return { value: grouped(Math.round(wh), 0), unit: 'Wh' };
}

export function power(w: number): Figure {
  return Math.abs(w) >= 10_000
    ? { value: grouped(w / 1000, 1), unit: 'kW' }
    : { value: grouped(Math.round(w), 0), unit: 'W' };
}

export function percent(pct: number): Figure {
  return { value: grouped(pct, 0), unit: '%' };
}

export function hours(h: number): Figure {
  return { value: grouped(h, h < 10 && h % 1 !== 0 ? 1 : 0), unit: 'h' };
}

/** Any quantity in shared/units.ts, shown in the chosen system. */
export function quantity(value: number, q: Quantity, system: UnitSystem, digits = 1): Figure {
  const d = toDisplay(value, q, system);
  return { value: grouped(d.value, digits), unit: d.unit };
}

export const temperature = (c: number, system: UnitSystem): Figure => quantity(c, 'temperature', system, 0);
export const mass = (kg: number, system: UnitSystem): Figure => quantity(kg, 'mass', system, 1);
export const volume = (l: number, system: UnitSystem): Figure => quantity(l, 'volume', system, 1);

/** Generator fuel in its own unit (kg of propane, litres of liquid fuel), converted for US display. */
export function fuelAmount(amount: number, unit: 'kg' | 'L', system: UnitSystem): Figure {
  return unit === 'kg' ? mass(amount, system) : volume(amount, system);
}

export const text = (f: Figure): string => `${f.value} ${f.unit}`;
