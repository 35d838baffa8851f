// Pure pieces of the cable check on the Rig tab: the check of what the form holds right now (runs that do not
// parse yet are set aside, not guessed at), sizes and lengths in the user's units, and each run's plain verdict.
import { z } from 'zod';
import {
  CONTINUOUS_PROTECTION_FACTOR,
  DROP_LIMIT_PCT,
  type RunCheck,
  type RunProblem,
} from '@/shared/engine/cable-check';
import type { CableRig, MissingPart } from '@/shared/engine/cable-current';
import { areaMm2, inFamily, nearestAwg, type SizeUnit } from '@/shared/engine/conductor-size';
import { suggestedDcRuns, type DcLoad } from '@/shared/engine/dc-run-defaults';
import { checkRuns, type CheckedRun } from '@/shared/engine/dc-wiring-check';
import {
  cableBasisSchema,
  dcRunSchema,
  type CableBasis,
  type ConductorSize,
  type DcRun,
  type DcRunKind,
} from '@/shared/schemas/dc-wiring';
import {
  batterySchema,
  controllerSchema,
  inverterSchema,
  solarArraySchema,
  vehicleChargerSchema,
} from '@/shared/schemas/rig';
import { fromDisplay, toDisplay, type UnitSystem } from '@/shared/units';
import type { Shown } from './rig-form-values';

const rigPartsSchema = z.object({
  battery: batterySchema,
  inverter: inverterSchema.nullable().default(null),
  controller: controllerSchema.nullable().default(null),
  solarArrays: z.array(solarArraySchema).default([]),
  vehicleCharger: vehicleChargerSchema.nullable().default(null),
});

/** The size family a person thinks in: AWG in the US, mm² elsewhere. */
export const unitFamily = (units: UnitSystem): SizeUnit => (units === 'us' ? 'awg' : 'mm2');

export type FormCheck =
  | { ready: false }
  | {
      ready: true;
      /** The rig parts the currents come from, parsed. */
      rig: CableRig;
      basis: CableBasis;
      /** True when no runs are entered and these are the ones the rig implies. */
      suggested: boolean;
      /** Per entered run, in order: its check, or null while its fields do not parse. */
      entered: (CheckedRun | null)[];
      /** The rig's implied runs, checked; shown while none are entered. */
      suggestions: CheckedRun[];
    };

const formWiringSchema = z.object({
  dcWiring: z
    .object({ basis: cableBasisSchema.catch('abyc-e11'), runs: z.array(z.unknown()).catch([]) })
    .catch({ basis: 'abyc-e11', runs: [] }),
});

/**
 * Checks the rig form as it stands (any half-typed state): the rig's own parts must parse first, since every
 * current comes from them; each run is checked once its own fields parse.
 */
export function checkForm(values: unknown, units: UnitSystem, dcLoads: readonly DcLoad[]): FormCheck {
  const parts = rigPartsSchema.safeParse(values);
  if (!parts.success) return { ready: false };
  const { basis, runs } = formWiringSchema.parse(values).dcWiring;
  const parsed = runs.map((r) => dcRunSchema.safeParse(r));
  const valid = parsed.flatMap((p) => (p.success ? [p.data] : []));
  const checked = checkRuns(valid, parts.data, basis);
  let next = 0;
  const entered = parsed.map((p) => (p.success ? (checked[next++] ?? null) : null));
  const suggestions =
    parsed.length === 0
      ? checkRuns(suggestedDcRuns(parts.data, basis, unitFamily(units), dcLoads), parts.data, basis)
      : [];
  return { ready: true, rig: parts.data, basis, suggested: parsed.length === 0, entered, suggestions };
}

const round = (v: number, digits: number) => Math.round(v * 10 ** digits) / 10 ** digits;

/** A run's one-way length, stored in metres, shown in m or ft. */
export function runLength(units: UnitSystem): Shown {
  const unit = toDisplay(0, 'length', units).unit;
  const show = (m: number) => round(toDisplay(m, 'length', units).value, 1);
  return {
    unit,
    show,
    store: (typed) => round(fromDisplay(typed, 'length', units), 3),
    range: (min, max) => `Enter a length from ${round(show(min), 1)} to ${round(show(max), 0)} ${unit}, one way.`,
  };
}

export function lengthText(m: number, units: UnitSystem): string {
  const d = toDisplay(m, 'length', units);
  return `${round(d.value, 1)} ${d.unit}`;
}

export function sizeText(size: ConductorSize): string {
  return size.unit === 'awg' ? `${size.awg} AWG` : `${size.mm2} mm²`;
}

/** The other family's figure: "≈ 2/0 AWG" beside a metric size, "33.6 mm²" beside an AWG one. */
export function equivalentText(size: ConductorSize): string {
  return size.unit === 'mm2' ? `≈ ${nearestAwg(size)} AWG` : `${round(areaMm2(size), 1)} mm²`;
}

export const sizeWithEquivalent = (size: ConductorSize): string => `${sizeText(size)} (${equivalentText(size)})`;

/** Amps to a sensible precision: tenths for small currents, whole amps above 10 A. */
export function ampsText(a: number): string {
  return `${a < 10 ? round(a, 1) : Math.round(a)} A`;
}

export const pctText = (p: number): string => `${p.toFixed(1)} %`;

const MISSING: Record<MissingPart, string> = {
  inverter: 'This rig has no inverter, so this run carries nothing yet: add the inverter above or remove the run.',
  controller: 'This rig has no charge controller, so this run’s current is unknown: add one above or remove the run.',
  solar: 'This rig has no solar array, so this run’s current is unknown: add an array above or remove the run.',
  'vehicle-charger':
    'This rig has no vehicle charger, so this run’s current is unknown: add one above or remove the run.',
  load: 'Enter the watts this circuit carries, or add DC load circuits for the distribution point to feed.',
};

export type Verdict = {
  tone: 'pass' | 'fail' | 'unknown';
  /** A few words for the run's badge. */
  headline: string;
  /** Plain sentences, most important first. */
  lines: string[];
};

const HEADLINE: Record<RunProblem, string> = {
  ampacity: 'too thin for the current',
  drop: 'loses too much voltage',
  'no-protection-fits': 'no fuse fits this cable',
  'protection-missing': 'no fuse or breaker',
  'protection-too-small': 'fuse too small',
  'protection-too-large': 'fuse too large for the cable',
};

function problemLine(problem: RunProblem, run: DcRun, c: Extract<RunCheck, { known: true }>, units: UnitSystem) {
  const { conductor, current } = c;
  const fitted = run.protection.kind === 'none' ? null : run.protection;
  const device = fitted?.kind === 'breaker' ? 'breaker' : 'fuse';
  const need = current.continuousA * CONTINUOUS_PROTECTION_FACTOR;
  switch (problem) {
    case 'ampacity':
      return `Too thin for the current: it must carry ${ampsText(current.continuousA)}, and ${sizeText(run.size)} is good for ${ampsText(conductor.ampacityA)} here.`;
    case 'drop':
      return `${conductor.carries ? `It carries the current (good for ${ampsText(conductor.ampacityA)}), but it` : 'It also'} loses ${pctText(conductor.dropPct)} of the voltage over ${lengthText(run.lengthM, units)} each way; the limit for this run is ${c.dropLimitPct} %.`;
    case 'no-protection-fits':
      return conductor.protectionA === null
        ? `No fuse on sale is large enough for 125 % of ${ampsText(current.continuousA)}.`
        : `No fuse on sale fits: the smallest at or above 125 % of ${ampsText(current.continuousA)} (${ampsText(need)}) is ${ampsText(conductor.protectionA)}, more than this cable may be protected by (${ampsText(conductor.maxProtectionA)}).`;
    case 'protection-missing':
      return conductor.protectionA
        ? `No fuse or breaker: fit one of ${ampsText(conductor.protectionA)} as close to the battery as it will go.`
        : 'No fuse or breaker: every run from the battery needs one, as close to the battery as it will go.';
    case 'protection-too-small':
      return `The ${ampsText(fitted?.amps ?? 0)} ${device} is under 125 % of the ${ampsText(current.continuousA)} this run carries (${ampsText(need)}), so it would open in normal use.`;
    case 'protection-too-large':
      return `The ${ampsText(fitted?.amps ?? 0)} ${device} is more than this cable may be protected by (${ampsText(conductor.maxProtectionA)}), so the cable could overheat before it opens.`;
  }
}

function smallestLine(c: Extract<RunCheck, { known: true }>, run: DcRun, basis: CableBasis): string | null {
  if (c.passes) return null;
  if (!c.smallest) {
    const largest = sizeText(inFamily({ unit: 'awg', awg: '4/0' }, run.size.unit));
    const other =
      basis === 'nfpa70' ? ' Table 310.16 assumes bundled conductors; ABYC E-11’s free-air figures are higher.' : '';
    return `No single conductor up to ${largest} passes here: shorten the run, use two conductors in parallel, or raise the system voltage, with an installer.${other}`;
  }
  // An array run without a fuse needs none (see the notes), so it is not told to fit one.
  const amps = c.conductor.protectionA;
  const noFuseNeeded = run.kind === 'array-controller' && run.protection.kind === 'none';
  const fuse = amps !== null && !noFuseNeeded ? ` with a ${ampsText(amps)} fuse` : '';
  return `Smallest that passes: ${sizeWithEquivalent(c.smallest)}${fuse}.`;
}

/** The plain verdict for one run. */
export function runVerdict(checked: CheckedRun, basis: CableBasis, units: UnitSystem): Verdict {
  const { run, check } = checked;
  if (!check.known) return { tone: 'unknown', headline: 'Current unknown', lines: [MISSING[check.missing]] };
  const lines: string[] = [];
  if (check.passes) {
    const protection = run.protection.kind === 'none' ? null : run.protection;
    lines.push(
      `Passes: it carries ${ampsText(check.current.continuousA)} (good for ${ampsText(check.conductor.ampacityA)}) and loses ${pctText(check.conductor.dropPct)} of the voltage (limit ${check.dropLimitPct} %)${protection ? `; the ${ampsText(protection.amps)} ${protection.kind} protects it` : ''}.`,
    );
  } else {
    for (const p of check.problems) lines.push(problemLine(p, run, check, units));
  }
  const smallest = smallestLine(check, run, basis);
  if (smallest) lines.push(smallest);
  if (check.notes.includes('time-delay') && check.current.surgeA !== null)
    lines.push(
      `Start-ups draw about ${ampsText(check.current.surgeA)} for a moment: choose a time-delay (slow-blow) fuse or breaker that rides through them.`,
    );
  if (check.notes.includes('array-protection-optional'))
    lines.push('One or two panel strings in parallel need no fuse of their own; three or more do.');
  return {
    tone: check.passes ? 'pass' : 'fail',
    headline: check.passes ? 'Passes' : `Fails: ${check.problems.map((p) => HEADLINE[p]).join(', ')}`,
    lines,
  };
}

/** Short names for a run's kind, for chips and buttons that must fit a phone's width. */
export const KIND_SHORT: Record<DcRunKind, string> = {
  'battery-inverter': 'Inverter',
  'battery-distribution': 'Distribution point',
  'controller-battery': 'Controller to battery',
  'array-controller': 'Array to controller',
  'dc-dc-charger': 'DC-DC charger',
  'dc-load': 'Load circuit',
};

export const BASIS_NOTES: Record<CableBasis, string> = {
  'abyc-e11':
    'ABYC E-11: the DC table for boats and vehicles, conductors in free air; in an engine space (50 °C) they carry less.',
  nfpa70:
    'NFPA 70 Table 310.16: conductors bundled in a raceway or cable at 30 °C. Stricter for big battery cables in free air.',
};

export const DROP_LIMIT_TEXT = `Critical runs may lose ${DROP_LIMIT_PCT.critical} % of the voltage, others ${DROP_LIMIT_PCT.other} %.`;
