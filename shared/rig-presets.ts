// Starting points for a new trip's rig. Typical sizes for each kind of vehicle (common practice),
// not any maker's product; every figure is editable on the Rig tab.
import type { RigInput } from './schemas/rig';

export type RigPreset = { id: string; label: string; description: string; rig: RigInput };

export const RIG_PRESETS: readonly RigPreset[] = [
  {
    id: 'van-small',
    label: 'Camper van, small',
    description: '100 Ah lithium, 200 W flat roof solar, 1000 W inverter, 30 A DC-DC charger.',
    rig: {
      name: 'Camper van',
      battery: { chemistry: 'lifepo4', capacityAh: 100, nominalV: 12.8 },
      solarArrays: [{ name: 'Roof', ratedW: 200, mounting: 'flat', fit: 'flush' }],
      controller: { kind: 'mppt', maxAmps: 20 },
      inverter: { ratedW: 1000, surgeW: 2000, efficiency: 0.9, idleW: 8 },
      shoreCharger: { amps: 15 },
      vehicleCharger: { kind: 'dc-dc', amps: 30 },
      propaneTanks: [{ name: 'Cylinder', propaneKg: 4.5 }],
      cabin: { lengthM: 5.4, widthM: 1.9, heightM: 1.9, insulation: 'standard', occupants: 2 },
    },
  },
  {
    id: 'caravan-lithium',
    label: 'Caravan, lithium',
    description: '200 Ah lithium, 400 W roof solar, 2000 W inverter, 25 A DC-DC, two 6 kg propane cylinders.',
    rig: {
      name: 'Caravan',
      battery: { chemistry: 'lifepo4', capacityAh: 200, nominalV: 12.8 },
      solarArrays: [{ name: 'Roof', ratedW: 400, mounting: 'flat', fit: 'flush' }],
      controller: { kind: 'mppt', maxAmps: 30 },
      inverter: { ratedW: 2000, surgeW: 4000, efficiency: 0.9, idleW: 12 },
      shoreCharger: { amps: 20 },
      vehicleCharger: { kind: 'dc-dc', amps: 25 },
      propaneTanks: [
        { name: 'Cylinder A', propaneKg: 6 },
        { name: 'Cylinder B', propaneKg: 6 },
      ],
      cabin: { lengthM: 6, widthM: 2.3, heightM: 2.1, insulation: 'standard', occupants: 2 },
    },
  },
  {
    id: 'caravan-agm',
    label: 'Caravan, lead-acid',
    description: '2 × 100 Ah AGM, 160 W roof solar on PWM, 300 W inverter, alternator charging.',
    rig: {
      name: 'Caravan (AGM)',
      battery: { chemistry: 'agm', capacityAh: 200, nominalV: 12 },
      solarArrays: [{ name: 'Roof', ratedW: 160, mounting: 'flat', fit: 'flush' }],
      controller: { kind: 'pwm', maxAmps: 15 },
      inverter: { ratedW: 300, efficiency: 0.88, idleW: 4 },
      shoreCharger: { amps: 15 },
      vehicleCharger: { kind: 'alternator', amps: 15 },
      propaneTanks: [{ name: 'Cylinder', propaneKg: 11 }],
      cabin: { lengthM: 6, widthM: 2.3, heightM: 2.1, insulation: 'standard', occupants: 2 },
    },
  },
  {
    id: 'trailer-large',
    label: 'Travel trailer',
    description:
      '5 kWh lithium, 800 W flat roof solar, 3000 W inverter, 2.2 kW dual-fuel generator, two 20 lb propane.',
    rig: {
      name: 'Travel trailer',
      battery: { chemistry: 'lifepo4', capacityAh: 390, nominalV: 12.8 },
      solarArrays: [{ name: 'Roof', ratedW: 800, mounting: 'flat', fit: 'flush' }],
      controller: { kind: 'mppt', maxAmps: 60 },
      inverter: { ratedW: 3000, surgeW: 6000, efficiency: 0.9, idleW: 25 },
      shoreCharger: { amps: 60 },
      vehicleCharger: { kind: 'dc-dc', amps: 40 },
      generator: { ratedW: 2200, fuel: 'propane', mode: { kind: 'rule', startBelowSocPct: 35, stopAboveSocPct: 85 } },
      propaneTanks: [
        { name: 'Cylinder A', propaneKg: 9.07 },
        { name: 'Cylinder B', propaneKg: 9.07 },
      ],
      cabin: { lengthM: 7.3, widthM: 2.4, heightM: 2.3, insulation: 'standard', occupants: 2 },
    },
  },
  {
    id: 'motorhome',
    label: 'Motorhome',
    description: '300 Ah lithium, 600 W roof solar, 2000 W inverter, 50 A DC-DC, 3.5 kW petrol generator.',
    rig: {
      name: 'Motorhome',
      battery: { chemistry: 'lifepo4', capacityAh: 300, nominalV: 12.8 },
      solarArrays: [{ name: 'Roof', ratedW: 600, mounting: 'flat', fit: 'flush' }],
      controller: { kind: 'mppt', maxAmps: 50 },
      inverter: { ratedW: 2000, surgeW: 4000, efficiency: 0.9, idleW: 15 },
      shoreCharger: { amps: 40 },
      vehicleCharger: { kind: 'dc-dc', amps: 50 },
      generator: { ratedW: 3500, fuel: 'petrol', mode: { kind: 'rule', startBelowSocPct: 30, stopAboveSocPct: 85 } },
      propaneTanks: [{ name: 'Tank', propaneKg: 11 }],
      cabin: { lengthM: 7, widthM: 2.3, heightM: 2.4, insulation: 'standard', occupants: 2 },
    },
  },
];

export function findRigPreset(id: string): RigPreset | undefined {
  return RIG_PRESETS.find((preset) => preset.id === id);
}
