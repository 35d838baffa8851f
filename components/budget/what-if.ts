// What-if changes as pure edits of the engine input, so the screen can recompute instantly in the
// browser and "keep this change" can send exactly the same edit to the server.
import { shiftSky } from '@/shared/engine/sky-outlook';
import type { EngineInputDraft } from '@/shared/schemas/engine-input';
import type { EngineWeather } from '@/shared/schemas/engine-weather';
import type { RigInput } from '@/shared/schemas/rig';
import type { StopInput } from '@/shared/schemas/trip';
import type { WhatIf, WhatIfKey } from '@/stores/what-if-store';

/** Half as much again: a size step people can buy (a second battery, more panels). */
export const WHAT_IF_SCALE = 1.5;
/** Solar added to a rig that has none: one common roof panel pair. */
export const ADDED_SOLAR_W = 200;

export const WHAT_IF_LABELS: Record<WhatIfKey, { label: string; hint: string }> = {
  extraBattery: { label: 'Half again the battery', hint: 'capacity × 1.5' },
  extraSolar: { label: 'More solar', hint: 'array watts × 1.5, or 200 W if there is none' },
  skipHookup: { label: 'Skip the hookups', hint: 'no shore power at any stop' },
  worseSky: { label: 'One sky level worse', hint: 'clear → hazy → broken cloud → overcast' },
};

export function rigWithExtraBattery(rig: RigInput): RigInput {
  return { ...rig, battery: { ...rig.battery, capacityAh: Math.round(rig.battery.capacityAh * WHAT_IF_SCALE) } };
}

export function rigWithExtraSolar(rig: RigInput): RigInput {
  const arrays = rig.solarArrays ?? [];
  if (arrays.length > 0)
    return { ...rig, solarArrays: arrays.map((a) => ({ ...a, ratedW: Math.round(a.ratedW * WHAT_IF_SCALE) })) };
  const amps = Math.ceil(ADDED_SOLAR_W / rig.battery.nominalV / 5) * 5;
  return {
    ...rig,
    solarArrays: [{ name: 'Roof array', ratedW: ADDED_SOLAR_W, mounting: 'flat', tiltDeg: 0 }],
    controller: rig.controller ?? { kind: 'mppt', maxAmps: amps },
  };
}

export const stopWithoutHookup = (stop: StopInput): StopInput => ({ ...stop, hookup: null });
export const stopWithWorseSky = (stop: StopInput): StopInput => ({
  ...stop,
  skyOutlook: shiftSky(stop.skyOutlook ?? 'clear', 1),
});

/** The plan with the recorded years the server's budget runs on (none fetched, or none held: as it is). */
export function withRecord(
  input: EngineInputDraft | null,
  weather: EngineWeather | null | undefined,
): EngineInputDraft | null {
  return input && weather ? { ...input, weather } : input;
}

export function applyWhatIf(input: EngineInputDraft, w: WhatIf): EngineInputDraft {
  let rig = input.rig;
  if (w.extraBattery) rig = rigWithExtraBattery(rig);
  if (w.extraSolar) rig = rigWithExtraSolar(rig);
  let stops = input.trip.stops;
  if (w.skipHookup) stops = stops.map(stopWithoutHookup);
  if (w.worseSky) stops = stops.map(stopWithWorseSky);
  return { ...input, rig, trip: { ...input.trip, stops } };
}
