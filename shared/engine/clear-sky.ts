// Clear-sky irradiance: Haurwitz (1945) global horizontal by default; Ineichen & Perez (2002) with the
// Kasten & Young (1989) air mass when a Linke turbidity is supplied.
const RAD = Math.PI / 180;

/** Haurwitz clear-sky GHI, W/m², from the apparent zenith angle. */
export function haurwitzGhi(zenithDeg: number): number {
  const cz = Math.cos(zenithDeg * RAD);
  return cz > 0 ? 1098 * cz * Math.exp(-0.059 / cz) : 0;
}

/** Kasten & Young (1989) relative optical air mass. */
export function kastenYoungAirMass(zenithDeg: number): number {
  if (zenithDeg >= 90) return Number.POSITIVE_INFINITY;
  return 1 / (Math.cos(zenithDeg * RAD) + 0.50572 * Math.pow(96.07995 - zenithDeg, -1.6364));
}

/** Standard-atmosphere pressure ratio p/p0 at an elevation, for the absolute air mass. */
export function pressureRatio(elevationM: number): number {
  return Math.pow(1 - 2.25577e-5 * elevationM, 5.25588);
}

export type IneichenInput = {
  zenithDeg: number;
  airMassAbsolute: number;
  linkeTurbidity: number;
  elevationM: number;
  dniExtra?: number;
};
export type Irradiance = { ghi: number; dni: number; dhi: number };

/** Ineichen–Perez clear sky; dniExtra defaults to the model's own I0 = 1364 W/m². */
export function ineichenPerez(i: IneichenInput): Irradiance {
  const cz = Math.cos(i.zenithDeg * RAD);
  if (cz <= 0 || !Number.isFinite(i.airMassAbsolute)) return { ghi: 0, dni: 0, dhi: 0 };
  const i0 = i.dniExtra ?? 1364;
  const h = i.elevationM;
  const tl = i.linkeTurbidity;
  const am = i.airMassAbsolute;
  const fh1 = Math.exp(-h / 8000);
  const fh2 = Math.exp(-h / 1250);
  const cg1 = 5.09e-5 * h + 0.868;
  const cg2 = 3.92e-5 * h + 0.0387;
  const ghi = cg1 * i0 * cz * Math.max(Math.exp(-cg2 * am * (fh1 + fh2 * (tl - 1))), 0);
  const b = 0.664 + 0.163 / fh1;
  const bnci = i0 * Math.max(b * Math.exp(-0.09 * am * (tl - 1)), 0);
  // Empirical cap so beam never exceeds what the global allows (Ineichen & Perez, Solar Energy 73).
  const bnci2 = ghi * Math.max((1 - (0.1 - 0.2 * Math.exp(-tl)) / (0.1 + 0.882 / fh1)) / cz, 0);
  const dni = Math.min(bnci, bnci2);
  return { ghi, dni, dhi: ghi - dni * cz };
}
