// Copper conductor tables for the cable check, per AWG size.
//
// Sources (CHECK-VALUES §8 unless said otherwise; confidence S = public transcriptions that agree):
// - NFPA 70 (the NEC) Table 310.16: ampacity of insulated conductors, not more than three current-carrying
//   conductors in a raceway or cable, 30 °C ambient; columns 60, 75 and 90 °C. (S; the 90 °C values for 3–1 AWG
//   differ between copies.)
// - NFPA 70 Chapter 9 Table 8: conductor area in circular mils, and DC resistance at 75 °C per 1000 ft, stranded,
//   uncoated (bare) and coated (tinned). (S)
// - ABYC E-11 / 33 CFR 183.425 Table 5: allowable amperage of conductors outside engine spaces, 105 °C column. (S)
//   The 60, 75 and 90 °C columns of the same table are from memory; 3 AWG appears only in the 105 °C column, so
//   for lower ratings it is given 4 AWG's figure (a larger conductor carries at least as much).
// - Engine spaces (50 °C ambient): the correction factors 0.58, 0.75, 0.82 and 0.86 for 60, 75, 90 and 105 °C
//   insulation, from memory of 33 CFR 183.425 Table 6 and of NFPA 70 Table 310.15(B)(1) at 46–50 °C, which agree.
// - NFPA 70 240.4(D): overcurrent protection of 14, 12 and 10 AWG copper at most 15, 20 and 30 A (from memory).
// - Standard fuse and breaker ratings: NFPA 70 240.6(A) from 15 A up (from memory), and the usual blade-fuse
//   ratings below it (1–10 A, common practice).
import type { AwgSize, CableBasis, InsulationRatingC } from '../schemas/dc-wiring';

type PerAwg = Readonly<Record<AwgSize, number>>;

/** Conductor area, circular mils (NFPA 70 Ch. 9 Table 8). */
export const CIRCULAR_MILS: PerAwg = {
  '14': 4110,
  '12': 6530,
  '10': 10380,
  '8': 16510,
  '6': 26240,
  '4': 41740,
  '3': 52620,
  '2': 66360,
  '1': 83690,
  '1/0': 105600,
  '2/0': 133100,
  '3/0': 167800,
  '4/0': 211600,
};

/** Circular mils in one square millimetre (1 cmil = π/4 × (0.0254 mm)²). */
export const CMIL_PER_MM2 = 1 / ((Math.PI / 4) * 0.0254 ** 2);

/** DC resistance at 75 °C, Ω per 1000 ft, stranded copper (NFPA 70 Ch. 9 Table 8). */
export const RESISTANCE_OHM_PER_KFT: Readonly<{ bare: PerAwg; tinned: PerAwg }> = {
  bare: {
    '14': 3.14,
    '12': 1.98,
    '10': 1.24,
    '8': 0.778,
    '6': 0.491,
    '4': 0.308,
    '3': 0.245,
    '2': 0.194,
    '1': 0.154,
    '1/0': 0.122,
    '2/0': 0.0967,
    '3/0': 0.0766,
    '4/0': 0.0608,
  },
  tinned: {
    '14': 3.26,
    '12': 2.05,
    '10': 1.29,
    '8': 0.809,
    '6': 0.51,
    '4': 0.321,
    '3': 0.254,
    '2': 0.201,
    '1': 0.16,
    '1/0': 0.127,
    '2/0': 0.101,
    '3/0': 0.0797,
    '4/0': 0.0626,
  },
};

/** NFPA 70 Table 310.16, A, by insulation rating; 105 °C insulation is read at 90 °C, the table's last column. */
const NFPA70_310_16: Readonly<Record<60 | 75 | 90, PerAwg>> = {
  60: {
    '14': 15,
    '12': 20,
    '10': 30,
    '8': 40,
    '6': 55,
    '4': 70,
    '3': 85,
    '2': 95,
    '1': 110,
    '1/0': 125,
    '2/0': 145,
    '3/0': 165,
    '4/0': 195,
  },
  75: {
    '14': 20,
    '12': 25,
    '10': 35,
    '8': 50,
    '6': 65,
    '4': 85,
    '3': 100,
    '2': 115,
    '1': 130,
    '1/0': 150,
    '2/0': 175,
    '3/0': 200,
    '4/0': 230,
  },
  90: {
    '14': 25,
    '12': 30,
    '10': 40,
    '8': 55,
    '6': 75,
    '4': 95,
    '3': 115,
    '2': 130,
    '1': 145,
    '1/0': 170,
    '2/0': 195,
    '3/0': 225,
    '4/0': 260,
  },
};

/** ABYC E-11 / 33 CFR 183.425, A, outside engine spaces, by insulation rating (105 °C from §8; the rest from memory). */
const ABYC_E11: Readonly<Record<InsulationRatingC, PerAwg>> = {
  60: {
    '14': 20,
    '12': 25,
    '10': 40,
    '8': 55,
    '6': 80,
    '4': 105,
    '3': 105,
    '2': 140,
    '1': 165,
    '1/0': 195,
    '2/0': 225,
    '3/0': 260,
    '4/0': 300,
  },
  75: {
    '14': 20,
    '12': 25,
    '10': 40,
    '8': 65,
    '6': 95,
    '4': 125,
    '3': 125,
    '2': 170,
    '1': 195,
    '1/0': 230,
    '2/0': 265,
    '3/0': 310,
    '4/0': 360,
  },
  90: {
    '14': 30,
    '12': 40,
    '10': 55,
    '8': 70,
    '6': 100,
    '4': 135,
    '3': 135,
    '2': 180,
    '1': 210,
    '1/0': 245,
    '2/0': 285,
    '3/0': 330,
    '4/0': 385,
  },
  105: {
    '14': 35,
    '12': 45,
    '10': 60,
    '8': 80,
    '6': 120,
    '4': 160,
    '3': 180,
    '2': 210,
    '1': 245,
    '1/0': 285,
    '2/0': 330,
    '3/0': 385,
    '4/0': 445,
  },
};

/** Share of its rating a conductor keeps in an engine space (50 °C air), by insulation rating. */
export const ENGINE_SPACE_FACTOR: Readonly<Record<InsulationRatingC, number>> = {
  60: 0.58,
  75: 0.75,
  90: 0.82,
  105: 0.86,
};

/** The table's ampacity for a conductor, before any engine-space correction, A. */
export function tableAmpacityA(basis: CableBasis, awg: AwgSize, insulationC: InsulationRatingC): number {
  if (basis === 'abyc-e11') return ABYC_E11[insulationC][awg];
  return NFPA70_310_16[insulationC === 105 ? 90 : insulationC][awg];
}

/** NFPA 70 240.4(D): the small sizes' protection is capped below their table ampacity. */
export const SMALL_CONDUCTOR_MAX_PROTECTION_A: Readonly<Partial<Record<AwgSize, number>>> = {
  '14': 15,
  '12': 20,
  '10': 30,
};

/** Fuse and breaker ratings on sale, A, smallest first. */
export const STANDARD_PROTECTION_A = [
  1, 2, 3, 5, 7.5, 10, 15, 20, 25, 30, 35, 40, 45, 50, 60, 70, 80, 90, 100, 110, 125, 150, 175, 200, 225, 250, 300, 350,
  400, 450, 500, 600, 700, 800, 1000,
] as const;
