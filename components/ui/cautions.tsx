import { Banner } from './banner';

// Safety wording shown beside the settings it concerns. It defers to local codes and installers on purpose.
export const CAUTIONS = {
  generator:
    'Generators make carbon monoxide: never run one inside, under an awning, or near an open window or vent, and keep a working CO alarm.',
  propane:
    'Propane: check for leaks, ventilate, fit an LPG alarm, keep cylinders upright and secured, and never cook with an open flame inside without ventilation.',
  lithiumCold:
    'Lithium batteries must not be charged below 0 °C. Lead-acid batteries vent hydrogen while charging: ventilate their compartment.',
  cabling:
    'DC cables at 12 V carry hundreds of amps: size conductors and fuses by the applicable code (for example NFPA 70 / the NEC, ABYC E-11 for boats, or your local RV/caravan electrical standard) and have a qualified installer check the work.',
} as const;

export function Caution({ kind, testID }: { kind: keyof typeof CAUTIONS; testID?: string }) {
  return <Banner testID={testID ?? `caution-${kind}`} tone="info" message={CAUTIONS[kind]} />;
}
