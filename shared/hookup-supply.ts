// The campground hookup supply usual where a stop is, from its IANA time zone. Basis (common practice, from
// memory; site pedestals vary, so the user can always pick another): Europe and the UK give 16 A at 230 V (a blue
// CEE 17 socket, sometimes less on older sites); North America gives 15/20, 30 or 50 A at 120 V (30 A the most
// common RV pedestal); Australia 10 or 15 A at 230–240 V (15 A powered sites usual); New Zealand 10 or 15 A at 230 V.
export type HookupSupply = { amps: number; volts: number };
export type HookupRegion = {
  region: 'europe' | 'north-america' | 'australia' | 'new-zealand';
  label: string;
  usual: HookupSupply;
  /** Every supply usual there, the usual one included. */
  options: HookupSupply[];
};

const EUROPE: HookupRegion = {
  region: 'europe',
  label: 'Europe and the UK',
  usual: { amps: 16, volts: 230 },
  options: [
    { amps: 6, volts: 230 },
    { amps: 10, volts: 230 },
    { amps: 16, volts: 230 },
  ],
};
const NORTH_AMERICA: HookupRegion = {
  region: 'north-america',
  label: 'North America',
  usual: { amps: 30, volts: 120 },
  options: [
    { amps: 15, volts: 120 },
    { amps: 20, volts: 120 },
    { amps: 30, volts: 120 },
    { amps: 50, volts: 120 },
  ],
};
const AUSTRALIA: HookupRegion = {
  region: 'australia',
  label: 'Australia',
  usual: { amps: 15, volts: 240 },
  options: [
    { amps: 10, volts: 240 },
    { amps: 15, volts: 240 },
  ],
};
const NEW_ZEALAND: HookupRegion = {
  region: 'new-zealand',
  label: 'New Zealand',
  usual: { amps: 15, volts: 230 },
  options: [
    { amps: 10, volts: 230 },
    { amps: 15, volts: 230 },
  ],
};

/** Every region of the table, in the order its supplies are offered after the stop's own. */
export const HOOKUP_REGIONS: readonly HookupRegion[] = [EUROPE, NORTH_AMERICA, AUSTRALIA, NEW_ZEALAND];

/** IANA zones of the United States and Canada outside the plain America/ list (their areas' own names). */
const NORTH_AMERICAN_ZONES = new Set([
  'America/New_York',
  'America/Chicago',
  'America/Denver',
  'America/Los_Angeles',
  'America/Phoenix',
  'America/Anchorage',
  'America/Boise',
  'America/Detroit',
  'America/Juneau',
  'America/Sitka',
  'America/Nome',
  'America/Yakutat',
  'America/Metlakatla',
  'America/Adak',
  'America/Menominee',
  'America/Toronto',
  'America/Vancouver',
  'America/Edmonton',
  'America/Winnipeg',
  'America/Halifax',
  'America/St_Johns',
  'America/Regina',
  'America/Whitehorse',
  'America/Yellowknife',
  'America/Moncton',
  'America/Glace_Bay',
  'America/Goose_Bay',
  'America/Iqaluit',
  'America/Rankin_Inlet',
  'America/Cambridge_Bay',
  'America/Dawson',
  'America/Dawson_Creek',
  'America/Fort_Nelson',
  'America/Creston',
  'America/Swift_Current',
  'America/Thunder_Bay',
  'Pacific/Honolulu',
]);

/** The usual hookup where a stop in this zone is, or null where the table does not know the country. */
export function hookupRegionOf(timeZone: string): HookupRegion | null {
  if (NORTH_AMERICAN_ZONES.has(timeZone) || /^America\/(Indiana|Kentucky|North_Dakota)\//.test(timeZone))
    return NORTH_AMERICA;
  if (/^US\/|^Canada\//.test(timeZone)) return NORTH_AMERICA;
  if (/^Europe\//.test(timeZone) || ['Atlantic/Canary', 'Atlantic/Madeira', 'Atlantic/Faroe'].includes(timeZone))
    return EUROPE;
  if (/^Australia\//.test(timeZone)) return AUSTRALIA;
  if (timeZone === 'Pacific/Auckland' || timeZone === 'Pacific/Chatham' || timeZone === 'NZ') return NEW_ZEALAND;
  return null;
}

/** Whether a supply is one of those usual in the zone's country (true where the country is not in the table). */
export function isUsualHookup(timeZone: string, supply: HookupSupply): boolean {
  const region = hookupRegionOf(timeZone);
  return !region || region.options.some((o) => o.amps === supply.amps && o.volts === supply.volts);
}
