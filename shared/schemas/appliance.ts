// Appliance contract: a load with its watts and when it runs.
import { z } from 'zod';
import { nameText } from './text';
import { fractionSchema, routineWindowsSchema } from './common';

export const circuitSchema = z.enum(['ac', 'dc', 'fuel']);
export type Circuit = z.infer<typeof circuitSchema>;

export const scheduleSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('always') }),
  z.object({ kind: z.literal('routine'), windows: routineWindowsSchema.min(1) }),
  z.object({
    kind: z.literal('thermostat'),
    /** cooling holds the cabin at or below the set point, heating at or above it (the cabin heat balance). */
    mode: z.enum(['cooling', 'heating']),
    setPointC: z.number().min(-10).max(40),
    /**
     * Cooling: the coefficient of performance (heat removed per unit of electricity; EER ÷ 3.412). Heating: the share
     * of the fuel's or electricity's energy that heats the cabin. Left out, a typical figure for the kind.
     */
    efficiency: z.number().min(0.3).max(6).optional(),
    /** Heat moved at full duty per unit, W; left out, it follows from the running or heat-input watts. */
    capacityW: z.number().min(0).max(20_000).optional(),
    /** When given, the thermostat is only active inside these windows (e.g. while someone is aboard). */
    activeWindows: routineWindowsSchema.optional(),
  }),
]);
export type Schedule = z.infer<typeof scheduleSchema>;

/** Watts drawn while running, and while idle (a calibration scales both, within these same bounds). */
export const runningWSchema = z.number().min(0).max(10_000);
export const standbyWSchema = z.number().min(0).max(500);

const applianceShape = {
  name: nameText(80, { empty: 'Give the appliance a name.' }),
  /** ac: through the inverter or hookup; dc: straight off the battery; fuel: burns propane, runningW is its fan/controls on DC. */
  circuit: circuitSchema,
  quantity: z.number().int().min(1).max(50).default(1),
  runningW: runningWSchema,
  standbyW: standbyWSchema.default(0),
  /** Share of the scheduled time the appliance actually draws running watts (a fridge compressor cycles). */
  dutyCycle: fractionSchema.default(1),
  surgeW: z.number().min(0).max(30_000).optional(),
  /** fuel circuit only: propane heat input while running, W (HHV). */
  heatInputW: z.number().min(0).max(40_000).default(0),
  schedule: scheduleSchema,
};

const heatInputOnlyForFuel = {
  check: (a: { circuit: string; heatInputW: number }) => a.circuit === 'fuel' || a.heatInputW === 0,
  params: { message: 'Only fuel appliances have heatInputW', path: ['heatInputW'] },
};

/** An appliance's fields without its id (the server assigns ids; forms edit these). */
export const applianceFieldsSchema = z
  .object(applianceShape)
  .refine(heatInputOnlyForFuel.check, heatInputOnlyForFuel.params);
export type ApplianceFields = z.infer<typeof applianceFieldsSchema>;

export const applianceSchema = z
  .object({ id: z.string().min(1).max(64), ...applianceShape })
  .refine(heatInputOnlyForFuel.check, heatInputOnlyForFuel.params);
export type Appliance = z.infer<typeof applianceSchema>;
export type ApplianceInput = z.input<typeof applianceSchema>;
