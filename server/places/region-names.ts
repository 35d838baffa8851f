// First-level regions by GeoNames admin1 code, for the countries whose travellers plan the most road trips
// with a rig. Elsewhere a place shows its country alone: GeoNames numbers most countries' regions, and a bare
// "08" would tell nobody anything. Names and codes: GeoNames admin1CodesASCII (CC BY 4.0); US codes are the
// postal abbreviations GeoNames uses.
const REGIONS: Record<string, Record<string, string>> = {
  GB: { ENG: 'England', SCT: 'Scotland', WLS: 'Wales', NIR: 'Northern Ireland' },
  US: {
    AL: 'Alabama',
    AK: 'Alaska',
    AZ: 'Arizona',
    AR: 'Arkansas',
    CA: 'California',
    CO: 'Colorado',
    CT: 'Connecticut',
    DE: 'Delaware',
    DC: 'District of Columbia',
    FL: 'Florida',
    GA: 'Georgia',
    HI: 'Hawaii',
    ID: 'Idaho',
    IL: 'Illinois',
    IN: 'Indiana',
    IA: 'Iowa',
    KS: 'Kansas',
    KY: 'Kentucky',
    LA: 'Louisiana',
    ME: 'Maine',
    MD: 'Maryland',
    MA: 'Massachusetts',
    MI: 'Michigan',
    MN: 'Minnesota',
    MS: 'Mississippi',
    MO: 'Missouri',
    MT: 'Montana',
    NE: 'Nebraska',
    NV: 'Nevada',
    NH: 'New Hampshire',
    NJ: 'New Jersey',
    NM: 'New Mexico',
    NY: 'New York',
    NC: 'North Carolina',
    ND: 'North Dakota',
    OH: 'Ohio',
    OK: 'Oklahoma',
    OR: 'Oregon',
    PA: 'Pennsylvania',
    RI: 'Rhode Island',
    SC: 'South Carolina',
    SD: 'South Dakota',
    TN: 'Tennessee',
    TX: 'Texas',
    UT: 'Utah',
    VT: 'Vermont',
    VA: 'Virginia',
    WA: 'Washington',
    WV: 'West Virginia',
    WI: 'Wisconsin',
    WY: 'Wyoming',
  },
  CA: {
    '01': 'Alberta',
    '02': 'British Columbia',
    '03': 'Manitoba',
    '04': 'New Brunswick',
    '05': 'Newfoundland and Labrador',
    '07': 'Nova Scotia',
    '08': 'Ontario',
    '09': 'Prince Edward Island',
    '10': 'Quebec',
    '11': 'Saskatchewan',
    '12': 'Yukon',
    '13': 'Northwest Territories',
    '14': 'Nunavut',
  },
  AU: {
    '01': 'Australian Capital Territory',
    '02': 'New South Wales',
    '03': 'Northern Territory',
    '04': 'Queensland',
    '05': 'South Australia',
    '06': 'Tasmania',
    '07': 'Victoria',
    '08': 'Western Australia',
  },
};

export function regionName(countryCode: string, adminCode: string): string | null {
  return REGIONS[countryCode]?.[adminCode] ?? null;
}

const displayNames = new Intl.DisplayNames(['en'], { type: 'region' });

/** "United Kingdom" for GB; the code itself where the runtime has no name for it. */
export function countryName(countryCode: string): string {
  try {
    return displayNames.of(countryCode) ?? countryCode;
  } catch {
    return countryCode;
  }
}
