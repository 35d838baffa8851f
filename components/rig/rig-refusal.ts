// Where a server refusal of a rig lands on the rig form: the API names fields by their path in the request
// ("rig.battery.capacityAh"), the form by its path in the rig ("battery.capacityAh"). Only fields the form shows
// with a message of their own (a name or a number) take one; a choice, or a rule about a whole part ("Solar arrays
// need a charge controller"), goes to the banner beside Save, so no message is lost.
import type { Path } from 'react-hook-form';
import type { RigInput } from '@/shared/schemas/rig';

/** The last part of every path the form shows as a text or number field with its own message. */
const FIELD_LEAVES = new Set([
  'name',
  'capacityAh',
  'nominalV',
  'reservePct',
  'initialSocPct',
  'lengthM',
  'occupants',
  'widthM',
  'heightM',
  'roofAreaM2',
  'ratedW',
  'tiltDeg',
  'azimuthDeg',
  'noctC',
  'gammaPctPerC',
  'vmpV',
  'derate',
  'maxAmps',
  'efficiency',
  'surgeW',
  'startHour',
  'endHour',
  'idleW',
  'amps',
  'startBelowSocPct',
  'stopAboveSocPct',
  'idleFuelKwhPerH',
  'fuelKwhPerKwhOut',
  'propaneKg',
  'fillPct',
  'loadW',
]);

/** The form's parts top to bottom; the roof area sits at the head of the solar section. */
const SCREEN_ORDER = [
  'name',
  'battery',
  'cabin',
  'roof',
  'solarArrays',
  'controller',
  'inverter',
  'shoreCharger',
  'vehicleCharger',
  'generator',
  'propaneTanks',
  'dcWiring',
];

/** The rig form's field for an API field, or undefined when no field of its own shows it. */
export function rigFieldOf(apiField: string): Path<RigInput> | undefined {
  const path = apiField.startsWith('rig.') ? apiField.slice(4) : apiField;
  const leaf = path.split('.').at(-1) ?? '';
  return FIELD_LEAVES.has(leaf) ? (path as Path<RigInput>) : undefined;
}

const rank = (path: string): [number, number] => {
  const [head = '', second = ''] = path.split('.');
  const part = path === 'cabin.roofAreaM2' ? 'roof' : head;
  const index = Number(second);
  return [SCREEN_ORDER.indexOf(part), Number.isInteger(index) ? index : 0];
};

/** The form's fields a refusal names, in the order they stand on screen (so the first is the one focused). */
export function rigFieldOrder(apiFields: readonly string[]): Path<RigInput>[] {
  const fields = apiFields.map(rigFieldOf).filter((f): f is Path<RigInput> => f !== undefined);
  return [...new Set(fields)].sort((a, b) => {
    const [ra, ia] = rank(a);
    const [rb, ib] = rank(b);
    return ra - rb || ia - ib;
  });
}
