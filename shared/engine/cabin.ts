// Cabin heat balance, steady state over each hour (the heat-balance form of ASHRAE Handbook — Fundamentals):
//   heat to remove (cooling) = UA·(T_out − T_set) + solar gain + internal gains, when positive;
//   heat to supply (heating) = UA·(T_set − T_out) − solar gain − internal gains, when positive.
// Equivalently the cabin would float at T_free = T_out + gains / UA, and a thermostat pulls it back to its set point.
//
// UA is the envelope area (a box of the rig's length, width and height) times a mean U-value for the insulation
// choice, windows and air leakage included (typical values, from memory): basic (a single-skin van or an old
// caravan) 1.6 W/m²K, standard (a touring caravan or travel trailer) 1.0, four-season (thick walls, double glazing)
// 0.6. A 6 m caravan at standard comes to about 60 W/K, a 5.4 m van about 45 W/K: within the trade's 40–80 and
// 25–50 W/K (CHECK-VALUES §11, M).
//
// Solar gain from the irradiance the engine already has at the pitch (after the site's shading): through the opaque
// roof and walls by the sol-air method, absorbed share α·I conducted in at U/h_o (α 0.3 for a light roof, 0.4 for
// the walls; outside film h_o 17 W/m²K, ASHRAE's summer design value), and through the windows at a solar heat gain
// coefficient of 0.5 (tinted acrylic double glazing with blinds part-drawn, from memory), windows 0.5 m² per metre
// of length (from memory). Walls and windows face every way: they take the mean irradiance of a vertical surface
// over all azimuths, DNI·sin z/π + DHI/2 + GHI·ρ/2 (isotropic sky). People at rest give about 100 W each
// (CHECK-VALUES §11, M); electric appliances running inside give all their energy to the cabin as heat, while the
// heat of propane burned for cooking or by an absorption fridge is taken to leave through vents and flues. The cabin
// has no thermal mass here: each hour stands on its own.
import type { Cabin, Insulation } from '../schemas/rig';

export const INSULATION_U: Readonly<Record<Insulation, number>> = { basic: 1.6, standard: 1.0, 'four-season': 0.6 };
export const PERSON_W = 100;
const ROOF_ABSORPTANCE = 0.3;
const WALL_ABSORPTANCE = 0.4;
const OUTSIDE_FILM_W_M2K = 17;
const WINDOW_SHGC = 0.5;
const WINDOW_M2_PER_M = 0.5;

export type CabinModel = {
  /** Heat transfer coefficient of the whole envelope, W/K. */
  ua: number;
  /** Solar gain per W/m² of horizontal irradiance on the roof, and per W/m² of mean vertical irradiance. */
  roofGainPerWm2: number;
  sideGainPerWm2: number;
  peopleW: number;
  /** freeRunningC and heatToMoveW for this cabin, for loops that ask them hour after hour. */
  floatC: (outsideC: number, gainsW: number) => number;
  heatToMove: (mode: 'cooling' | 'heating', cabinC: number, setPointC: number) => number;
};

export function envelopeAreaM2(c: Pick<Cabin, 'lengthM' | 'widthM' | 'heightM'>): number {
  return 2 * (c.lengthM * c.widthM + c.lengthM * c.heightM + c.widthM * c.heightM);
}

export function cabinModel(c: Cabin): CabinModel {
  const u = INSULATION_U[c.insulation];
  const roof = c.lengthM * c.widthM;
  const windows = WINDOW_M2_PER_M * c.lengthM;
  const walls = Math.max(0, 2 * (c.lengthM + c.widthM) * c.heightM - windows);
  const m: CabinModel = {
    ua: u * envelopeAreaM2(c),
    roofGainPerWm2: (roof * ROOF_ABSORPTANCE * u) / OUTSIDE_FILM_W_M2K,
    sideGainPerWm2: (walls * WALL_ABSORPTANCE * u) / OUTSIDE_FILM_W_M2K + windows * WINDOW_SHGC,
    peopleW: c.occupants * PERSON_W,
    floatC(outsideC, gainsW) {
      return freeRunningC(m, outsideC, gainsW);
    },
    heatToMove(mode, cabinC, setPointC) {
      return heatToMoveW(m, mode, cabinC, setPointC);
    },
  };
  return m;
}

/** Mean irradiance on a vertical surface over all azimuths, W/m²: beam DNI·sin z/π, sky DHI/2, ground GHI·ρ/2. */
export function meanVerticalIrradiance(dni: number, dhi: number, ghi: number, sinZenith: number, rho: number): number {
  return (dni * sinZenith) / Math.PI + dhi / 2 + (ghi * rho) / 2;
}

/** Solar gain into the cabin, W, from the horizontal and mean vertical irradiance at the pitch. */
export function cabinSolarGainW(m: CabinModel, ghi: number, verticalWm2: number): number {
  return m.roofGainPerWm2 * ghi + m.sideGainPerWm2 * verticalWm2;
}

/** The temperature the cabin floats at with these gains and no heating or cooling, °C. */
export function freeRunningC(m: CabinModel, outsideC: number, gainsW: number): number {
  return outsideC + gainsW / m.ua;
}

/** Heat a thermostat must move to hold its set point from the cabin's present temperature, W (0 when satisfied). */
export function heatToMoveW(m: CabinModel, mode: 'cooling' | 'heating', cabinC: number, setPointC: number): number {
  return Math.max(0, m.ua * (mode === 'cooling' ? cabinC - setPointC : setPointC - cabinC));
}

/** The cabin's solar gain for a loop over many samples: from the beam, diffuse and global irradiance at the pitch. */
export function solarGainOf(
  m: CabinModel,
  rho: number,
): (dni: number, dhi: number, ghi: number, cosZenith: number) => number {
  return (dni, dhi, ghi, cosZenith) => {
    const sinZenith = Math.sqrt(Math.max(0, 1 - cosZenith * cosZenith));
    return cabinSolarGainW(m, ghi, meanVerticalIrradiance(dni, dhi, ghi, sinZenith, rho));
  };
}
