// Hookup: the pitch's supply (amps × volts) passes AC loads through and feeds the shore charger with what is
// left; the shore charger's own current limit caps the charge.

export function hookupCapacityW(amps: number, volts: number): number {
  return amps * volts;
}

/** DC charge power from a charger fed by `acAvailableW`, W. */
export function chargerDcW(acAvailableW: number, chargerAmps: number, chargeV: number, efficiency: number): number {
  return Math.max(0, Math.min(chargerAmps * chargeV, acAvailableW * efficiency));
}
