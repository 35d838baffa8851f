// DC wiring contract: the rig's DC runs (battery to inverter, to the distribution point, from the charge
// controller and the array, the DC-DC charger, DC load circuits) and the code the cable check reads them against.
// Lengths are one way, in metres; sizes are named as the trade sells them (AWG in North America, mm² elsewhere).
import { z } from 'zod';

/** American Wire Gauge sizes the check's tables cover, smallest first. */
export const AWG_SIZES = ['14', '12', '10', '8', '6', '4', '3', '2', '1', '1/0', '2/0', '3/0', '4/0'] as const;
export type AwgSize = (typeof AWG_SIZES)[number];

/** IEC 60228 metric sizes from the first at least as large as 14 AWG up to the first beyond 4/0 AWG, in mm². */
export const METRIC_SIZES_MM2 = [2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120] as const;
export type MetricSize = (typeof METRIC_SIZES_MM2)[number];

export const conductorSizeSchema = z.discriminatedUnion('unit', [
  z.object({ unit: z.literal('awg'), awg: z.enum(AWG_SIZES) }),
  z.object({ unit: z.literal('mm2'), mm2: z.literal(METRIC_SIZES_MM2) }),
]);
export type ConductorSize = z.infer<typeof conductorSizeSchema>;

/** The insulation's temperature rating, °C, as printed on the cable. */
export const INSULATION_RATINGS_C = [60, 75, 90, 105] as const;
export type InsulationRatingC = (typeof INSULATION_RATINGS_C)[number];

export const DC_RUN_KINDS = [
  'battery-inverter',
  'battery-distribution',
  'controller-battery',
  'array-controller',
  'dc-dc-charger',
  'dc-load',
] as const;
export const dcRunKindSchema = z.enum(DC_RUN_KINDS);
export type DcRunKind = z.infer<typeof dcRunKindSchema>;

export const protectionSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('none') }),
  z.object({ kind: z.literal('fuse'), amps: z.number().min(1).max(1000) }),
  z.object({ kind: z.literal('breaker'), amps: z.number().min(1).max(1000) }),
]);
export type Protection = z.infer<typeof protectionSchema>;

/** Most rigs have under a dozen runs; the cap keeps one rig's record small. */
export const MAX_DC_RUNS = 24;
/** One-way length bounds, m: shorter than 10 cm is a bus bar, longer than 60 m is no vehicle's run. */
export const DC_RUN_LENGTH_M = { min: 0.1, max: 60 } as const;

/** A load circuit's watts, running and at start-up: the appliance bounds. */
export const MAX_LOAD_W = 10_000;
export const MAX_SURGE_W = 30_000;

const loadOnly = new Set<DcRunKind>(['dc-load', 'battery-distribution']);

export const dcRunSchema = z
  .object({
    kind: dcRunKindSchema,
    name: z.string().trim().min(1).max(80),
    lengthM: z.number().min(DC_RUN_LENGTH_M.min).max(DC_RUN_LENGTH_M.max),
    size: conductorSizeSchema,
    insulationC: z.literal(INSULATION_RATINGS_C).default(105),
    tinned: z.boolean().default(false),
    /** Inside an engine space the air is hotter (50 °C assumed) and the conductor carries less. */
    engineSpace: z.boolean().default(false),
    /** Critical runs are held to a 3 % voltage drop, others to 10 % (ABYC E-11). */
    critical: z.boolean().default(true),
    protection: protectionSchema.default({ kind: 'none' }),
    /** A DC load circuit's running watts; for the distribution point, the watts it feeds (else the load runs' sum). */
    loadW: z.number().min(0).max(MAX_LOAD_W).optional(),
    /** Start-up watts of the circuit's largest motor, for a moment. */
    surgeW: z.number().min(0).max(MAX_SURGE_W).optional(),
  })
  .refine((r) => r.kind !== 'dc-load' || r.loadW !== undefined, {
    message: 'A DC load circuit needs the watts it carries',
    path: ['loadW'],
  })
  .refine((r) => loadOnly.has(r.kind) || (r.loadW === undefined && r.surgeW === undefined), {
    message:
      'Only load circuits and the distribution point take load watts; other runs take their current from the rig',
    path: ['loadW'],
  });
export type DcRun = z.infer<typeof dcRunSchema>;
export type DcRunInput = z.input<typeof dcRunSchema>;

/** ABYC E-11's DC table (free air, 105 °C column and its engine-space factors) or NFPA 70 Table 310.16. */
export const cableBasisSchema = z.enum(['abyc-e11', 'nfpa70']);
export type CableBasis = z.infer<typeof cableBasisSchema>;

export const dcWiringSchema = z.object({
  basis: cableBasisSchema.default('abyc-e11'),
  runs: z.array(dcRunSchema).max(MAX_DC_RUNS).default([]),
});
export type DcWiring = z.infer<typeof dcWiringSchema>;

/** A rig with no runs entered yet: a fresh object each time, so a form never edits a shared default. */
export const emptyDcWiring = (): DcWiring => ({ basis: 'abyc-e11', runs: [] });
