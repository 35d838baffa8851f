// PV module: cell temperature by the NOCT model (Ross 1980), power with a linear temperature coefficient
// (the PVWatts-style DC model), times a system derate.

/** Extra cell heating of flush roof panels over racked ones, °C at NOCT conditions (from memory: 10–20 °C). */
export const FLUSH_EXTRA_C = 12;

/** Ross/NOCT cell temperature, °C. */
export function noctCellTempC(ambientC: number, poaWm2: number, noctC: number): number {
  return ambientC + ((noctC - 20) / 800) * poaWm2;
}

/** The effective NOCT of a fitted array. */
export function effectiveNoctC(noctC: number, fit: 'flush' | 'racked'): number {
  return fit === 'flush' ? noctC + FLUSH_EXTRA_C : noctC;
}

/** DC power at maximum power point, W; gamma is per °C (e.g. −0.004). */
export function pvDcPowerW(ratedW: number, poaWm2: number, cellC: number, gammaPerC: number, derate: number): number {
  if (poaWm2 <= 0) return 0;
  return Math.max(0, ratedW * (poaWm2 / 1000) * (1 + gammaPerC * (cellC - 25)) * derate);
}

/** noctCellTempC for one fitted array, for a loop over many samples. */
export function cellTemperatureOf(
  noctC: number,
  fit: 'flush' | 'racked',
): (ambientC: number, poaWm2: number) => number {
  const noct = effectiveNoctC(noctC, fit);
  return (ambientC, poaWm2) => noctCellTempC(ambientC, poaWm2, noct);
}
