// Rig contract: the power system a trip runs on.
import { z } from 'zod';
import { nameText } from './text';
import { fractionSchema, localHourSchema, percentSchema, positiveSchema, routineWindowsSchema } from './common';
import { dcWiringSchema, emptyDcWiring } from './dc-wiring';
import { LIMITS } from './limits';

export const chemistrySchema = z.enum(['lifepo4', 'agm', 'flooded']);
export type Chemistry = z.infer<typeof chemistrySchema>;

export const batterySchema = z.object({
  chemistry: chemistrySchema,
  capacityAh: positiveSchema.max(10_000),
  nominalV: z.number().min(6).max(60),
  /** State of charge that must never be crossed; left out, it follows the chemistry's recommended depth of discharge. */
  reservePct: percentSchema.optional(),
  initialSocPct: percentSchema.default(100),
  /** Inside the living space the battery is at the cabin's temperature; outside, at the air's. */
  heatedSpace: z.boolean().default(false),
});
export type Battery = z.infer<typeof batterySchema>;

export const solarArraySchema = z
  .object({
    name: nameText(80, { empty: 'Give the array a name.' }).default('Roof array'),
    ratedW: positiveSchema.max(20_000),
    mounting: z.enum(['flat', 'tilted']).default('flat'),
    tiltDeg: z.number().min(0).max(90).default(0),
    /** Direction the panel faces, degrees clockwise from north (180 = south). */
    azimuthDeg: z.number().min(0).max(360).default(180),
    /** Flush roof panels have little air behind them and run hotter than racked ones. */
    fit: z.enum(['flush', 'racked']).default('flush'),
    noctC: z.number().min(30).max(70).default(45),
    gammaPctPerC: z.number().min(-1).max(0).default(-0.4),
    /** Maximum-power voltage; matters for PWM controllers, which hold the panel at battery voltage. */
    vmpV: z.number().positive().max(200).default(18),
    derate: fractionSchema.default(0.86),
    /** Panels set out on the ground: they take no roof area, so the roof's room for more panels ignores them. */
    portable: z.boolean().default(false),
  })
  .refine((a) => a.mounting === 'tilted' || a.tiltDeg === 0, {
    message: 'A flat array has tiltDeg 0',
    path: ['tiltDeg'],
  });
export type SolarArray = z.infer<typeof solarArraySchema>;

export const controllerSchema = z.object({
  kind: z.enum(['mppt', 'pwm']).default('mppt'),
  maxAmps: positiveSchema.max(500),
  efficiency: z.number().min(0.5).max(1).default(0.97),
});
export type Controller = z.infer<typeof controllerSchema>;

/** Local hours the inverter is kept on; endHour < startHour means the window crosses midnight. */
export const inverterHoursSchema = z.object({ startHour: localHourSchema, endHour: localHourSchema });

export const inverterSchema = z
  .object({
    ratedW: positiveSchema.max(20_000),
    surgeW: positiveSchema.max(60_000).optional(),
    /** Nominal (peak) efficiency; light loads get less, along the part-load curve. */
    efficiency: z.number().min(0.5).max(1).default(0.9),
    idleW: z.number().min(0).max(200).default(10),
    /**
     * on-demand: switched on only in hours with AC load on the battery; always: on the whole trip; scheduled: on in
     * `onHours` every day (and whenever AC loads run).
     */
    mode: z.enum(['on-demand', 'always', 'scheduled']).default('on-demand'),
    onHours: inverterHoursSchema.optional(),
  })
  .refine((inv) => inv.mode !== 'scheduled' || inv.onHours !== undefined, {
    message: 'Give the hours the inverter is kept on',
    path: ['onHours'],
  });
export type Inverter = z.infer<typeof inverterSchema>;
export type InverterInput = z.input<typeof inverterSchema>;

export const shoreChargerSchema = z.object({
  amps: positiveSchema.max(500),
  efficiency: z.number().min(0.5).max(1).default(0.9),
});
export type ShoreCharger = z.infer<typeof shoreChargerSchema>;

export const vehicleChargerSchema = z.object({
  kind: z.enum(['dc-dc', 'alternator']).default('dc-dc'),
  amps: positiveSchema.max(300),
});
export type VehicleCharger = z.infer<typeof vehicleChargerSchema>;

export const fuelKindSchema = z.enum(['propane', 'petrol', 'diesel']);
export type FuelKind = z.infer<typeof fuelKindSchema>;

export const generatorModeSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('rule'),
    startBelowSocPct: percentSchema.default(40),
    stopAboveSocPct: percentSchema.default(90),
  }),
  z.object({ kind: z.literal('routine'), windows: routineWindowsSchema.min(1) }),
  z.object({ kind: z.literal('off') }),
]);
export type GeneratorMode = z.infer<typeof generatorModeSchema>;

/** Part-load fuel model, as fuel energy (higher heating value): idle + slope × electrical output. */
export const fuelModelSchema = z.object({
  idleFuelKwhPerH: z.number().min(0).max(50),
  fuelKwhPerKwhOut: z.number().min(1).max(20),
});
export type FuelModel = z.infer<typeof fuelModelSchema>;

export const generatorSchema = z
  .object({
    ratedW: positiveSchema.max(20_000),
    fuel: fuelKindSchema.default('petrol'),
    mode: generatorModeSchema.default({ kind: 'rule', startBelowSocPct: 40, stopAboveSocPct: 90 }),
    fuelModel: fuelModelSchema.optional(),
  })
  .refine((g) => g.mode.kind !== 'rule' || g.mode.stopAboveSocPct > g.mode.startBelowSocPct, {
    message: 'stopAboveSocPct must be above startBelowSocPct',
    path: ['mode', 'stopAboveSocPct'],
  });
export type Generator = z.infer<typeof generatorSchema>;

export const insulationSchema = z.enum(['basic', 'standard', 'four-season']);
export type Insulation = z.infer<typeof insulationSchema>;

/** The living space, for its heat balance: outside size of the body, its insulation and who is aboard. */
export const cabinSchema = z.object({
  lengthM: z.number().min(2).max(20).default(6),
  widthM: z.number().min(1.2).max(3).default(2.3),
  heightM: z.number().min(1.2).max(3.5).default(2.1),
  insulation: insulationSchema.default('standard'),
  occupants: z.number().int().min(0).max(12).default(2),
  /** Roof area that could carry panels, m²; without it the roof is taken as length × width. */
  roofAreaM2: z.number().min(1).max(60).optional(),
});
export type Cabin = z.infer<typeof cabinSchema>;
export type CabinInput = z.input<typeof cabinSchema>;

export const propaneTankSchema = z.object({
  name: nameText(80, { empty: 'Give the tank a name.' }).default('Cylinder'),
  propaneKg: positiveSchema.max(500),
  fillPct: percentSchema.default(100),
});
export type PropaneTank = z.infer<typeof propaneTankSchema>;

export const rigSchema = z
  .object({
    name: nameText(120, { empty: 'Give the rig a name.' }),
    battery: batterySchema,
    solarArrays: z
      .array(solarArraySchema)
      .max(LIMITS.solarArraysPerRig, { error: `A rig has at most ${LIMITS.solarArraysPerRig} solar arrays.` })
      .default([]),
    controller: controllerSchema.nullable().default(null),
    inverter: inverterSchema.nullable().default(null),
    shoreCharger: shoreChargerSchema.nullable().default(null),
    vehicleCharger: vehicleChargerSchema.nullable().default(null),
    generator: generatorSchema.nullable().default(null),
    propaneTanks: z
      .array(propaneTankSchema)
      .max(LIMITS.propaneTanksPerRig, { error: `A rig has at most ${LIMITS.propaneTanksPerRig} cylinders.` })
      .default([]),
    /** The DC runs for the cable check; none stored, the check suggests runs from the rig's parts. */
    dcWiring: dcWiringSchema.default(emptyDcWiring),
    cabin: cabinSchema.default(cabinSchema.parse({})),
  })
  .refine((r) => r.solarArrays.length === 0 || r.controller !== null, {
    message: 'Solar arrays need a charge controller',
    path: ['controller'],
  });
export type Rig = z.infer<typeof rigSchema>;
export type RigInput = z.input<typeof rigSchema>;
