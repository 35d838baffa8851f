// Words for flags. Every figure and time in a flag's title and text comes from the flag's own fields through these
// functions, so the title, the text, the headline and the ledger cannot disagree about a number or an hour.
import type { Flag, FlagLowest, FlagWindow } from './result-types';

const WEEKDAYS = ['Sun', 'Mon', 'Tue', 'Wed', 'Thu', 'Fri', 'Sat'] as const;
const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'] as const;

/** "Mon 14 Sep, 13:00" from an engine local label (2027-09-14T13:00+01:00): the wall clock it carries. */
export function momentText(localIso: string): string {
  const y = Number(localIso.slice(0, 4));
  const m = Number(localIso.slice(5, 7));
  const d = Number(localIso.slice(8, 10));
  if (!Number.isFinite(y) || !Number.isFinite(m) || !Number.isFinite(d)) return localIso;
  // The date alone, at UTC midnight, gives the weekday without any machine time zone.
  const weekday = WEEKDAYS[new Date(Date.UTC(y, m - 1, d)).getUTCDay()] ?? '';
  return `${weekday} ${d} ${MONTHS[m - 1] ?? ''}, ${localIso.slice(11, 16)}`;
}

/** Whole numbers with thousands separators ("1,290"); others as they are. */
export function groupedNumber(value: number): string {
  if (!Number.isInteger(value)) return String(value);
  const digits = String(Math.abs(value)).replace(/\B(?=(\d{3})+(?!\d))/g, ',');
  return value < 0 ? `−${digits}` : digits;
}

export function whText(wh: number): string {
  return `${groupedNumber(Math.round(wh))} Wh`;
}

/** The figure a flag's title shows: its size, in its unit. */
export function flagSizeText(flag: Pick<Flag, 'size'>): string {
  return `${groupedNumber(flag.size.value)} ${flag.size.unit}`;
}

export function windowText(w: FlagWindow): string {
  return `from ${momentText(w.startLocal)} to ${momentText(w.endLocal)}`;
}

export function lowestText(l: FlagLowest): string {
  return `lowest ${l.socPct.toFixed(0)} % at ${momentText(l.atLocal)}`;
}

function capitalise(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

export type ShortfallWords = {
  whereText: string;
  kind: 'energy-short' | 'below-reserve';
  energyShortWh: number;
  belowReserveWh: number;
  reservePct: number;
  window: FlagWindow;
  lowest: FlagLowest;
  /** "roof air conditioner 71 %, fridge 12 %", or empty when nothing drew the battery down. */
  causesText: string;
};

/** A shortfall flag's text: where, the window, the energy, the lowest charge and the leading causes. */
export function shortfallText(f: ShortfallWords): string {
  const what =
    f.kind === 'energy-short'
      ? `runs the battery empty ${windowText(f.window)}: ${whText(f.energyShortWh)} short`
      : `is below the ${f.reservePct} % reserve ${windowText(f.window)}: ${whText(f.belowReserveWh)} below it`;
  const causes = f.causesText ? ` Drawn down by ${f.causesText}.` : '';
  return `${capitalise(f.whereText)} ${what}; ${lowestText(f.lowest)}.${causes}`;
}

export { capitalise };

/**
 * An appliance's name inside a sentence: "Roof air conditioner" reads "roof air conditioner", but a name that starts
 * with an abbreviation, a unit or a figure ("TV", "LED strip", "12 V fridge") keeps its capitals.
 */
export function nameInSentence(name: string): string {
  const first = name.split(' ', 1)[0] ?? '';
  // Only a capital that opens an otherwise lower-case word ("Fridge", "Fan-assisted") is sentence case.
  const capitalisedWord = /^\p{Lu}[^\p{Lu}\d]+$/u.test(first);
  return capitalisedWord ? `${first.charAt(0).toLowerCase()}${name.slice(1)}` : name;
}
