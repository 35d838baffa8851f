// tz-lookup ships no types: it maps a latitude and longitude to an IANA time zone name.
declare module 'tz-lookup' {
  export default function tzlookup(lat: number, lon: number): string;
}
