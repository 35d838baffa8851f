// The demo rigs' DC runs (invented, like the rest of the demo data). Each rig has one run that carries its
// current but loses too much voltage, so the cable check has something to say on both trips. Fields left out take
// the schema's defaults: 105 °C insulation, bare copper, outside an engine space, a critical (3 %) run.
import { dcRunSchema, type DcRun, type DcRunInput, type DcWiring } from '../schemas/dc-wiring';

const run = (fields: DcRunInput): DcRun => dcRunSchema.parse(fields);
const fuse = (amps: number) => ({ kind: 'fuse' as const, amps });
const breaker = (amps: number) => ({ kind: 'breaker' as const, amps });
const mm2 = (size: 2.5 | 4 | 6 | 10 | 16 | 25 | 35 | 50 | 70) => ({ unit: 'mm2' as const, mm2: size });
const awg = (size: '14' | '10' | '8' | '6' | '2' | '4/0') => ({ unit: 'awg' as const, awg: size });

/** The 6 m caravan: tinned metric cable, the 400 W roof array run down to the controller in 6 mm². */
export const HIGHLAND_DC_WIRING: DcWiring = {
  basis: 'abyc-e11',
  runs: [
    run({ kind: 'battery-inverter', name: 'Battery to inverter', lengthM: 1.2, size: mm2(70), protection: fuse(250) }),
    run({ kind: 'controller-battery', name: 'MPPT to battery', lengthM: 1.5, size: mm2(10), protection: fuse(40) }),
    run({ kind: 'array-controller', name: 'Roof array to MPPT', lengthM: 6, size: mm2(6), insulationC: 90 }),
    run({ kind: 'dc-dc-charger', name: 'DC-DC charger to battery', lengthM: 1, size: mm2(10), protection: fuse(40) }),
    run({
      kind: 'dc-load',
      name: 'Fridge circuit',
      lengthM: 4,
      size: mm2(4),
      insulationC: 90,
      critical: false,
      protection: fuse(10),
      loadW: 60,
      surgeW: 180,
    }),
    run({
      kind: 'battery-distribution',
      name: 'Battery to 12 V panel',
      lengthM: 2,
      size: mm2(10),
      protection: fuse(30),
      loadW: 200,
    }),
  ].map((r) => ({ ...r, tinned: true })),
};

/** The travel trailer: AWG cable, and the tow vehicle's charge line in 10 AWG all the way back. */
export const DESERT_DC_WIRING: DcWiring = {
  basis: 'abyc-e11',
  runs: [
    run({
      kind: 'battery-inverter',
      name: 'Battery to inverter',
      lengthM: 1.5,
      size: awg('4/0'),
      protection: fuse(400),
    }),
    run({
      kind: 'controller-battery',
      name: 'Controller to battery',
      lengthM: 1.8,
      size: awg('6'),
      protection: breaker(80),
    }),
    run({
      kind: 'array-controller',
      name: 'Roof array to controller',
      lengthM: 7,
      size: awg('2'),
      insulationC: 90,
      protection: breaker(80),
    }),
    run({ kind: 'dc-dc-charger', name: 'Tow vehicle charge line', lengthM: 8, size: awg('10'), protection: fuse(40) }),
    run({
      kind: 'dc-load',
      name: 'Roof fan',
      lengthM: 6,
      size: awg('14'),
      insulationC: 90,
      critical: false,
      protection: fuse(10),
      loadW: 40,
      surgeW: 90,
    }),
    run({
      kind: 'battery-distribution',
      name: 'Battery to 12 V panel',
      lengthM: 2.5,
      size: awg('8'),
      protection: fuse(40),
      loadW: 300,
    }),
  ],
};
