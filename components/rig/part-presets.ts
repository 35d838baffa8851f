// Common parts as starting values for the rig form. Typical catalogue sizes, not any maker's product.
import type { RigInput } from '@/shared/schemas/rig';

type Battery = RigInput['battery'];
type Inverter = NonNullable<RigInput['inverter']>;
type Generator = NonNullable<RigInput['generator']>;

export const BATTERY_PRESETS: { label: string; battery: Partial<Battery> }[] = [
  { label: '100 Ah LiFePO4', battery: { chemistry: 'lifepo4', capacityAh: 100, nominalV: 12.8 } },
  { label: '2 × 100 Ah LiFePO4', battery: { chemistry: 'lifepo4', capacityAh: 200, nominalV: 12.8 } },
  { label: '280 Ah LiFePO4', battery: { chemistry: 'lifepo4', capacityAh: 280, nominalV: 12.8 } },
  { label: '2 × 110 Ah AGM', battery: { chemistry: 'agm', capacityAh: 220, nominalV: 12 } },
];

export const SOLAR_PRESETS = [100, 200, 400, 800];

export const INVERTER_PRESETS: { label: string; inverter: Inverter }[] = [
  { label: '1000 W', inverter: { ratedW: 1000, efficiency: 0.9, idleW: 8, mode: 'on-demand' } },
  { label: '2000 W', inverter: { ratedW: 2000, efficiency: 0.9, idleW: 12, mode: 'on-demand' } },
  { label: '3000 W', inverter: { ratedW: 3000, efficiency: 0.9, idleW: 25, mode: 'on-demand' } },
];

export const GENERATOR_PRESETS: { label: string; generator: Generator }[] = [
  {
    label: '2 kW petrol inverter generator',
    generator: { ratedW: 2000, fuel: 'petrol', mode: { kind: 'rule', startBelowSocPct: 40, stopAboveSocPct: 90 } },
  },
  {
    label: '2.2 kW dual-fuel on propane',
    generator: { ratedW: 2200, fuel: 'propane', mode: { kind: 'rule', startBelowSocPct: 30, stopAboveSocPct: 85 } },
  },
];

export const TANK_PRESETS: { label: string; propaneKg: number }[] = [
  { label: '6 kg cylinder', propaneKg: 6 },
  { label: '20 lb cylinder', propaneKg: 9.07 },
  { label: '11 kg cylinder', propaneKg: 11 },
];
