// Charge controller. MPPT converts array power at its efficiency; PWM connects the panel straight to the
// battery, so the panel works at battery voltage and gives up the difference to its maximum-power voltage.
// Both are capped by the controller's output current.

export type ControllerSpec = { kind: 'mppt' | 'pwm'; efficiency: number; maxAmps: number };

/** Share of maximum power a PWM controller keeps: the panel's current held at charging voltage. */
export function pwmFactor(chargeV: number, vmpV: number): number {
  return Math.min(1, chargeV / vmpV);
}

/** Controller output before the current cap, W. */
export function controllerOutputW(c: ControllerSpec, pvMppW: number, chargeV: number, vmpV: number): number {
  return c.kind === 'mppt' ? pvMppW * c.efficiency : pvMppW * pwmFactor(chargeV, vmpV);
}

export function controllerLimitW(c: ControllerSpec, chargeV: number): number {
  return c.maxAmps * chargeV;
}
