// Appliance library: typical loads for planning. Every figure is "typical", not a measurement of any product;
// `basis` says where it comes from: the trade's rules of thumb (CHECK-VALUES §10, common practice) or from memory.
import type { ApplianceInput, Schedule } from '../schemas/appliance';

export type LibraryBasis = 'common practice (CHECK-VALUES §10)' | 'from memory';

export type LibraryItem = {
  key: string;
  name: string;
  circuit: 'ac' | 'dc' | 'fuel';
  runningW: number;
  standbyW: number;
  dutyCycle: number;
  surgeW?: number;
  heatInputW: number;
  schedule: Schedule;
  typical: true;
  basis: LibraryBasis;
  note: string;
};

const evening = (startHour: number, minutes: number): Schedule => ({
  kind: 'routine',
  windows: [{ days: { kind: 'all' }, startHour, startMinute: 0, minutes }],
});
const MEMORY: LibraryBasis = 'from memory';
const TRADE: LibraryBasis = 'common practice (CHECK-VALUES §10)';

function item(
  i: Omit<LibraryItem, 'typical' | 'standbyW' | 'dutyCycle' | 'heatInputW'> &
    Partial<Pick<LibraryItem, 'standbyW' | 'dutyCycle' | 'heatInputW'>>,
): LibraryItem {
  return { standbyW: 0, dutyCycle: 1, heatInputW: 0, ...i, typical: true };
}

export const APPLIANCE_LIBRARY: readonly LibraryItem[] = [
  item({
    key: 'led-lights',
    name: 'LED lights',
    circuit: 'dc',
    runningW: 10,
    schedule: evening(18, 300),
    basis: TRADE,
    note: 'cabin LED lighting ≈ 10 W',
  }),
  item({
    key: 'fridge-12v-compressor',
    name: '12 V compressor fridge',
    circuit: 'dc',
    runningW: 45,
    dutyCycle: 0.35,
    schedule: { kind: 'always' },
    basis: MEMORY,
    note: 'compressor 40–60 W cycling about a third of the time; more in heat',
  }),
  item({
    key: 'fridge-absorption-propane',
    name: 'Absorption fridge on propane',
    circuit: 'fuel',
    runningW: 2,
    heatInputW: 380,
    dutyCycle: 0.5,
    schedule: { kind: 'always' },
    basis: MEMORY,
    note: 'burner ≈ 1,300 Btu/h cycling; a couple of watts of controls on 12 V',
  }),
  item({
    key: 'water-pump',
    name: 'Water pump',
    circuit: 'dc',
    runningW: 60,
    schedule: {
      kind: 'routine',
      windows: [
        { days: { kind: 'all' }, startHour: 7, startMinute: 0, minutes: 10 },
        { days: { kind: 'all' }, startHour: 19, startMinute: 0, minutes: 10 },
      ],
    },
    basis: MEMORY,
    note: 'about 5 A at 12 V while running',
  }),
  item({
    key: 'roof-vent-fan',
    name: 'Roof vent fan',
    circuit: 'dc',
    runningW: 25,
    schedule: evening(20, 180),
    basis: MEMORY,
    note: '1–3 A at 12 V depending on speed',
  }),
  item({
    key: 'box-fan',
    name: 'Box fan',
    circuit: 'ac',
    runningW: 75,
    schedule: evening(21, 240),
    basis: TRADE,
    note: 'household box fan ≈ 50–100 W',
  }),
  item({
    key: 'roof-air-conditioner',
    name: 'Roof air conditioner',
    circuit: 'ac',
    runningW: 1400,
    surgeW: 2800,
    schedule: { kind: 'thermostat', mode: 'cooling', setPointC: 26 },
    basis: TRADE,
    note: '1.3–1.5 kW while the compressor runs (CHECK-VALUES §10); it cycles to hold the set point; EER about 10 (COP 2.9, §11, from memory); start surge from memory',
  }),
  item({
    key: 'furnace-propane',
    name: 'Propane furnace',
    circuit: 'fuel',
    runningW: 45,
    heatInputW: 7000,
    schedule: { kind: 'thermostat', mode: 'heating', setPointC: 18 },
    basis: MEMORY,
    note: 'about 24,000 Btu/h of propane; the blower draws 3–4 A at 12 V',
  }),
  item({
    key: 'propane-heater',
    name: 'Fan-assisted propane heater',
    circuit: 'fuel',
    runningW: 15,
    heatInputW: 2000,
    schedule: { kind: 'thermostat', mode: 'heating', setPointC: 17 },
    basis: MEMORY,
    note: 'small blown-air unit, ≈ 7,000 Btu/h',
  }),
  item({
    key: 'diesel-air-heater',
    name: 'Diesel air heater',
    circuit: 'dc',
    runningW: 15,
    schedule: { kind: 'thermostat', mode: 'heating', setPointC: 17, capacityW: 2000 },
    basis: MEMORY,
    note: 'about 2 kW of heat; the glow plug peaks near 100 W at start, then 10–20 W; burns diesel from the vehicle tank (not in the propane ledger)',
  }),
  item({
    key: 'induction-hob',
    name: 'Induction hob',
    circuit: 'ac',
    runningW: 1800,
    schedule: evening(18, 20),
    basis: MEMORY,
    note: 'one zone at high power',
  }),
  item({
    key: 'microwave',
    name: 'Microwave',
    circuit: 'ac',
    runningW: 1000,
    surgeW: 1500,
    schedule: evening(18, 10),
    basis: TRADE,
    note: 'about 1000 W input for a 700 W oven',
  }),
  item({
    key: 'kettle',
    name: 'Kettle',
    circuit: 'ac',
    runningW: 1500,
    schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 7, startMinute: 0, minutes: 5 }] },
    basis: MEMORY,
    note: 'low-power travel kettle; household kettles draw 2–3 kW',
  }),
  item({
    key: 'coffee-maker',
    name: 'Coffee maker',
    circuit: 'ac',
    runningW: 900,
    schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 7, startMinute: 15, minutes: 10 }] },
    basis: MEMORY,
    note: 'drip machine while brewing',
  }),
  item({
    key: 'hair-dryer',
    name: 'Hair dryer',
    circuit: 'ac',
    runningW: 1600,
    schedule: { kind: 'routine', windows: [{ days: { kind: 'all' }, startHour: 7, startMinute: 30, minutes: 10 }] },
    basis: MEMORY,
    note: 'high setting',
  }),
  item({
    key: 'laptop',
    name: 'Laptop',
    circuit: 'ac',
    runningW: 60,
    schedule: evening(19, 180),
    basis: MEMORY,
    note: 'charger under load',
  }),
  item({
    key: 'phone-charging',
    name: 'Phone charging',
    circuit: 'dc',
    runningW: 10,
    schedule: evening(21, 120),
    basis: MEMORY,
    note: 'USB charger, per phone',
  }),
  item({
    key: 'tv',
    name: 'TV',
    circuit: 'ac',
    runningW: 100,
    standbyW: 1,
    schedule: evening(20, 120),
    basis: TRADE,
    note: 'TV ≈ 100 W',
  }),
  item({
    key: 'cpap',
    name: 'CPAP',
    circuit: 'dc',
    runningW: 40,
    schedule: evening(22, 480),
    basis: MEMORY,
    note: '30–60 W without a heated humidifier',
  }),
  item({
    key: 'satellite-internet',
    name: 'Satellite internet terminal',
    circuit: 'ac',
    runningW: 75,
    schedule: evening(8, 720),
    basis: MEMORY,
    note: '50–100 W while connected',
  }),
  item({
    key: 'propane-stove',
    name: 'Propane stove',
    circuit: 'fuel',
    runningW: 0,
    heatInputW: 2600,
    schedule: evening(18, 30),
    basis: MEMORY,
    note: 'one burner ≈ 9,000 Btu/h',
  }),
  item({
    key: 'propane-oven',
    name: 'Propane oven',
    circuit: 'fuel',
    runningW: 0,
    heatInputW: 2900,
    dutyCycle: 0.6,
    schedule: evening(17, 45),
    basis: MEMORY,
    note: 'oven burner ≈ 10,000 Btu/h, cycling',
  }),
];

export function libraryItem(key: string): LibraryItem | undefined {
  return APPLIANCE_LIBRARY.find((i) => i.key === key);
}

/** An appliance input from a library entry; overrides (id, schedule, watts) win. */
export function applianceFromLibrary(key: string, overrides: Partial<ApplianceInput> & { id: string }): ApplianceInput {
  const i = libraryItem(key);
  if (!i) throw new Error(`No library appliance ${key}`);
  const base: ApplianceInput = {
    id: overrides.id,
    name: i.name,
    circuit: i.circuit,
    runningW: i.runningW,
    standbyW: i.standbyW,
    dutyCycle: i.dutyCycle,
    heatInputW: i.heatInputW,
    schedule: i.schedule,
    ...(i.surgeW === undefined ? {} : { surgeW: i.surgeW }),
  };
  return { ...base, ...overrides };
}
