// The shapes simulateTrip and findHeadroom return. Plain data (numbers, strings, arrays) so they serialise.
import type { Schedule } from '../schemas/appliance';
import type { FuelKind } from '../schemas/rig';

export type Where = { kind: 'stop'; stopIndex: number } | { kind: 'drive'; driveIndex: number };

export type LedgerRow = {
  index: number;
  utc: string;
  local: string;
  where: Where;
  stepH: number;
  sunAltitudeDeg: number;
  /** Plane-of-array irradiance of the first array (GHI if flat), W/m², step average, at the site. */
  irradianceWm2: number;
  ambientC: number;
  /** The cabin's air temperature from its heat balance (held at the thermostats' set points where they can), °C. */
  cabinC: number;
  /** The battery's temperature where it sits (the cabin's inside, the air's outside), °C. */
  batteryC: number;
  /** Share of its rated capacity the battery can deliver at that temperature, %. */
  batteryCapacityPct: number;
  solarAvailableWh: number;
  solarUsedWh: number;
  solarWastedWh: number;
  acLoadWh: number;
  dcLoadWh: number;
  inverterLossWh: number;
  chargerLossWh: number;
  batteryLossWh: number;
  hookupWh: number;
  vehicleWh: number;
  generatorWh: number;
  generatorH: number;
  /** Generator fuel in the generator's unit (kg propane, L petrol/diesel). */
  generatorFuel: number;
  propaneBurnedKg: number;
  /** Into the battery terminals (+) or out of them (−), Wh. */
  batteryFlowWh: number;
  storedWh: number;
  socPct: number;
  energyShortWh: number;
  propaneLeftKg: number;
};

export type FuelAmount = { fuel: FuelKind; amount: number; unit: 'kg' | 'L' };

export type DaySheet = {
  dayIndex: number;
  /** Local date of the place at the day's first step, YYYY-MM-DD. */
  date: string;
  stopIndexes: number[];
  travel: boolean;
  harvestWh: number;
  solarAvailableWh: number;
  useWh: number;
  /** Everything that came in: solar used, hookup, vehicle and generator, Wh. */
  sourcesWh: number;
  /** Inverter, charger and battery losses, Wh. */
  lossesWh: number;
  /** All sources in minus use minus losses, Wh: what the day added to the battery, less what it could not supply. */
  netWh: number;
  hookupWh: number;
  vehicleWh: number;
  generatorWh: number;
  generatorHours: number;
  generatorFuel: number;
  propaneUsedKg: number;
  lowestSocPct: number;
  endSocPct: number;
  energyShortWh: number;
};

export type Headline = {
  capacityWh: number;
  reservePct: number;
  lowestSocPct: number;
  lowestAtUtc: string;
  lowestAtLocal: string;
  lowestWhere: Where;
  energyShortWh: number;
  /** Usable battery (above reserve) over the average daily draw, with no charging at all. */
  daysOfAutonomy: number;
  /** Share of all energy sources that came from solar. */
  solarFraction: number;
  solarUsedWh: number;
  solarWastedWh: number;
  hookupWh: number;
  vehicleWh: number;
  generatorHours: number;
  generatorFuel: FuelAmount | null;
  propaneStartKg: number;
  propaneLeftKg: number;
};

export type FixKind =
  | 'add-generator-hours'
  | 'add-hookup-night'
  | 'move-appliance-to-drive'
  | 'add-battery'
  | 'add-solar'
  | 'stagger-appliances'
  | 'larger-inverter'
  | 'add-propane'
  | 'keep-battery-warm'
  | 'check-cabling'
  | 'thermostat-setting'
  | 'appliance-less'
  | 'appliance-another-time'
  | 'appliance-shore-only'
  | 'appliance-generator-only';

/**
 * What walking the battery again with the fix applied gave: whether the flag clears, and the lowest charge then.
 * With recorded years the fix is walked in each of them: it clears when the flag's rows hold in at least the
 * chosen share of years (`years`), and the lowest charge is the one that share of years stays above.
 */
export type FixCheck = { clears: boolean; lowestSocPct: number; years?: { held: number; of: number } };

export type Fix = {
  kind: FixKind;
  text: string;
  params: Record<string, number | string | boolean | string[]>;
  /** Present on fixes that were checked by re-simulation. */
  check?: FixCheck;
  /** The schedule an appliance fix gives the appliance (the edit Apply sends). */
  applianceEdit?: { applianceId: string; schedule: Schedule };
};

export type FlagKind =
  'below-reserve' | 'energy-short' | 'inverter-overload' | 'cold-charge-blocked' | 'propane-out' | 'high-dc-current';

/** The ledger rows a flag spans: its first and last row, and its start and end on the ledger's hour grid. */
export type FlagWindow = {
  firstRow: number;
  lastRow: number;
  /** Start of the first row. */
  startUtc: string;
  startLocal: string;
  /** End of the last row (the start of the row after it). */
  endUtc: string;
  endLocal: string;
};

/** What drew the battery down before a flag, in energy: an appliance, the inverter, or the battery's own losses. */
export type Cause = {
  kind: 'appliance' | 'inverter' | 'battery-loss';
  name: string;
  applianceId: string | null;
  /** The battery's draw attributed to it over the draw-down, Wh. */
  wh: number;
  /** Its share of that draw, %. */
  sharePct: number;
};

/** The lowest charge inside a flag's window: the ledger row where it is reached, labelled as the ledger labels it. */
export type FlagLowest = { socPct: number; row: number; atUtc: string; atLocal: string };

export type Flag = {
  id: string;
  kind: FlagKind;
  severity: 'danger' | 'warning' | 'info';
  /** When the flag is shown at: its lowest charge's row (the same instant as `lowest.atUtc`). */
  atUtc: string;
  atLocal: string;
  where: Where;
  /** The flag's text, built from the fields below by one formatter (flag-text.ts). */
  cause: string;
  size: { value: number; unit: 'Wh' | 'W' | 'A' | 'kg' | 'h' };
  window: FlagWindow;
  /** Energy the battery could not supply inside the window: the sum of the window's ledger rows, Wh. */
  energyShortWh: number;
  /** How far below the reserve the lowest charge falls, Wh (0 when it stays at or above it). */
  belowReserveWh: number;
  lowest: FlagLowest;
  /** Rows from the highest charge before the flag to its lowest: the draw-down the causes are counted over. */
  drawdown: { firstRow: number; lastRow: number };
  /** The battery's draw over the draw-down by cause, largest first (shortfall flags; empty for the others). */
  causes: Cause[];
};

/** A flag's fixes, checked apart from the budget (checkFixes) and matched to the flag by its id. */
export type FlagFixes = { flagId: string; fixes: Fix[] };

/** A flag with its fixes, as the screens show it. */
export type FlagWithFixes = Flag & { fixes: Fix[] };

export type BandRun = { skyShift: -1 | 1; socPct: number[]; lowestSocPct: number };

/** One recorded year's run: the year of the record and the trip's lowest charge in it. */
export type YearLow = { year: number; lowestSocPct: number };

/** The chance the plan holds: the trip run once per recorded year. */
export type PlanChance = {
  /** Years run, and in how many the lowest charge stayed at or above the reserve. */
  years: number;
  held: number;
  /** The median year (the planned run the ledger shows), a bad year (1 in 10) and the worst year. */
  median: YearLow;
  bad: YearLow;
  worst: YearLow;
  /** Every year, lowest charge first. */
  byYear: YearLow[];
};

/** Where each stop's sky came from in this budget, and how many stops plan on an assumed (preset) sky. */
export type SkySummary = { sources: ('record' | 'forecast' | 'preset')[]; assumedStops: number };

export type SimulationResult = {
  ledger: LedgerRow[];
  days: DaySheet[];
  headline: Headline;
  flags: Flag[];
  /** One preset level better and worse; null when the plan runs on recorded years (socBand replaces it). */
  band: { better: BandRun; worse: BandRun } | null;
  /** The chance the plan holds; null when no stop has a record. */
  chance: PlanChance | null;
  /** The 10th and 90th percentile of state of charge, step by step, over the recorded years. */
  socBand: { p10: number[]; p90: number[] } | null;
  skies: SkySummary;
};
