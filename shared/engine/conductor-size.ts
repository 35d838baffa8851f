// Conductor sizes in either family (AWG or mm²): area, the AWG row of the tables a size is rated by, the
// equivalence between families, and stepping through the sizes on sale. Areas: NFPA 70 Ch. 9 Table 8 for AWG;
// IEC 60228 nominal areas for metric sizes.
import { AWG_SIZES, METRIC_SIZES_MM2, type AwgSize, type ConductorSize, type MetricSize } from '../schemas/dc-wiring';
import { CIRCULAR_MILS, CMIL_PER_MM2 } from './conductor-tables';

export type SizeUnit = ConductorSize['unit'];

export const awg = (size: AwgSize): ConductorSize => ({ unit: 'awg', awg: size });
export const mm2 = (size: MetricSize): ConductorSize => ({ unit: 'mm2', mm2: size });

export function areaCmil(size: ConductorSize): number {
  return size.unit === 'awg' ? CIRCULAR_MILS[size.awg] : size.mm2 * CMIL_PER_MM2;
}

export function areaMm2(size: ConductorSize): number {
  return size.unit === 'mm2' ? size.mm2 : CIRCULAR_MILS[size.awg] / CMIL_PER_MM2;
}

/**
 * The AWG row a size is rated by: itself, or for a metric size the largest AWG no larger in area (so a metric
 * conductor is never credited with more than the table gives a bigger one). The smallest metric size on the list
 * is at least 14 AWG, so there is always one.
 */
export function ratingAwg(size: ConductorSize): AwgSize {
  if (size.unit === 'awg') return size.awg;
  const area = areaCmil(size);
  return [...AWG_SIZES].reverse().find((a) => CIRCULAR_MILS[a] <= area) ?? '14';
}

/** The AWG closest in area, for showing a metric size's equivalent (log scale: sizes step by ratio). */
export function nearestAwg(size: ConductorSize): AwgSize {
  if (size.unit === 'awg') return size.awg;
  const area = areaCmil(size);
  const distance = (a: AwgSize) => Math.abs(Math.log(CIRCULAR_MILS[a] / area));
  return AWG_SIZES.reduce((best, a) => (distance(a) < distance(best) ? a : best));
}

/** Every size of a family, smallest first. */
export function sizesOf(unit: SizeUnit): ConductorSize[] {
  return unit === 'awg' ? AWG_SIZES.map(awg) : METRIC_SIZES_MM2.map(mm2);
}

const sameSize = (a: ConductorSize, b: ConductorSize) =>
  a.unit === 'awg' ? b.unit === 'awg' && a.awg === b.awg : b.unit === 'mm2' && a.mm2 === b.mm2;

/** The next size up (step 1) or down (step −1) in the same family, or null at either end. */
export function stepSize(size: ConductorSize, step: 1 | -1): ConductorSize | null {
  const list = sizesOf(size.unit);
  const i = list.findIndex((s) => sameSize(s, size));
  return list[i + step] ?? null;
}

/** The same conductor in the other family: the smallest size at least as large in area (or the largest there is). */
export function inFamily(size: ConductorSize, unit: SizeUnit): ConductorSize {
  if (size.unit === unit) return size;
  const list = sizesOf(unit);
  const area = areaCmil(size);
  return list.find((s) => areaCmil(s) >= area) ?? (list[list.length - 1] as ConductorSize);
}
