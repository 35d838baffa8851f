// Charge controller. MPPT holds the array at its maximum power point and converts at its efficiency. PWM connects
// the array straight to the battery, so the array works at the charging voltage and delivers the current the
// single-diode model gives at that voltage (De Soto et al. 2006 parameters at the cell temperature; single-diode.ts)
// times that voltage — not maximum power scaled by V_batt/V_mp. Both are capped by the controller's output current.
import type { Controller, SolarArray } from '../schemas/rig';
import { pvDcPowerW } from './pv-module';
import { currentAt, deSotoParams, maxPowerPoint, MODULE_CLASSES, type ModuleClass } from './single-diode';

/** Watts the controller passes to the battery bus from one array, before its current cap. */
export type ArrayOutput = (effectiveIrradianceWm2: number, cellC: number) => number;

/** The module class a panel belongs to by its maximum-power voltage: a "12 V" 36-cell panel sits near 18 V. */
export function moduleClassFor(vmpV: number): ModuleClass {
  return vmpV < 24 ? MODULE_CLASSES.cells36 : MODULE_CLASSES.cells60;
}

/**
 * Share of the array's rated (STC) maximum power a PWM controller draws at the charging voltage, for this effective
 * irradiance and cell temperature. The class's curve is stretched in voltage so its STC maximum-power voltage is the
 * panel's own V_mp (a longer or shorter string of the same cells); currents are the class's.
 */
export function pwmShareOfRated(vmpV: number, chargeV: number, effectiveIrradianceWm2: number, cellC: number): number {
  return pwmCurve(vmpV)(effectiveIrradianceWm2, cellC, chargeV);
}

function pwmCurve(vmpV: number): (g: number, cellC: number, chargeV: number) => number {
  const cls = moduleClassFor(vmpV);
  const stc = maxPowerPoint(deSotoParams(cls, 1000, 25));
  const stretch = vmpV / stc.v;
  return (g, cellC, chargeV) => {
    if (!(g > 0)) return 0;
    const cellV = chargeV / stretch; // the operating point on the class's own curve
    return (Math.max(0, currentAt(deSotoParams(cls, g, cellC), cellV)) * cellV) / stc.p;
  };
}

export function arrayOutput(c: Controller, a: SolarArray, chargeV: number): ArrayOutput {
  const gamma = a.gammaPctPerC / 100;
  if (c.kind === 'mppt') return (g, cellC) => pvDcPowerW(a.ratedW, g, cellC, gamma, a.derate) * c.efficiency;
  const share = pwmCurve(a.vmpV);
  return (g, cellC) => a.ratedW * a.derate * share(g, cellC, chargeV);
}

export function controllerLimitW(c: { maxAmps: number }, chargeV: number): number {
  return c.maxAmps * chargeV;
}
