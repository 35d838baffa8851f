// Vehicle charging on drives: a DC-DC charger delivers its rated current; a direct alternator link delivers
// less because of voltage drop along the cable (common practice: roughly half of the fuse rating reaches the bank).

export const ALTERNATOR_SHARE = 0.5;

export function vehicleChargeW(kind: 'dc-dc' | 'alternator', amps: number, chargeV: number): number {
  return amps * chargeV * (kind === 'alternator' ? ALTERNATOR_SHARE : 1);
}
