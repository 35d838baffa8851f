// The words for the chance the plan holds and for where stops' skies come from. Pure, so they are tested alone.
import type { PlanChance, SkySummary } from '@/shared/engine/result-types';
import type { StopSkySource } from '@/shared/schemas/trip';
import type { StopWeatherStatus } from '@/shared/schemas/weather';

const pct = (v: number) => `${Math.round(v)}%`;

export function chanceHeadline(chance: PlanChance): string {
  return `Holds in ${chance.held} of ${chance.years} past ${chance.years === 1 ? 'year' : 'years'}`;
}

/** The median, a bad (1 in 10) and the worst year, each with its lowest charge. */
export function chanceYears(chance: PlanChance): { label: string; year: number; lowest: string }[] {
  return [
    { label: 'Median year', year: chance.median.year, lowest: pct(chance.median.lowestSocPct) },
    { label: 'A bad year (1 in 10)', year: chance.bad.year, lowest: pct(chance.bad.lowestSocPct) },
    { label: 'Worst year', year: chance.worst.year, lowest: pct(chance.worst.lowestSocPct) },
  ];
}

/** "2 of 4 stops use an assumed sky", or null when every stop has a record or forecast. */
export function assumedSkyText(skies: SkySummary | undefined, stopCount: number): string | null {
  const assumed = skies ? skies.assumedStops : stopCount;
  if (assumed === 0) return null;
  if (assumed === stopCount)
    return stopCount === 1 ? 'The stop uses an assumed sky' : `All ${stopCount} stops use an assumed sky`;
  return `${assumed} of ${stopCount} ${stopCount === 1 ? 'stop uses' : 'stops use'} an assumed sky`;
}

/** What a stop asked for: where its sky comes from, its own sky's name, and whether its low and high stand. */
export type StopSkyChoice = { source: StopSkySource; presetName: string; ownTemperatures: boolean };

/** Where one stop's sky comes from, in a line for the Route tab, with its temperatures when they are the person's. */
export function stopSkyText(status: StopWeatherStatus | undefined, choice: StopSkyChoice): string {
  const temperatures = choice.ownTemperatures ? ' · Temperatures: your low and high' : '';
  return skyLine(status, choice) + temperatures;
}

function skyLine(status: StopWeatherStatus | undefined, choice: StopSkyChoice): string {
  const { presetName } = choice;
  const forecastDays = status?.forecastDays ?? 0;
  if (choice.source === 'preset') return `Sky: your pick, ${presetName} (the weather record is not used)`;
  if (choice.source === 'forecast')
    return forecastDays > 0
      ? `Sky from the forecast for ${forecastDays} ${forecastDays === 1 ? 'day' : 'days'}; other days assumed ${presetName}`
      : `Sky: forecast chosen, none for this stop yet: the sky is assumed ${presetName}`;
  const forecast = forecastDays > 0 ? `; forecast for ${forecastDays} days` : '';
  if (!status) return `Sky: ${presetName} (assumed)`;
  switch (status.state) {
    case 'loading':
      return `Weather record: loading, ${status.yearsReady} of ${status.yearsWanted} years${forecast}. Meanwhile the sky is assumed ${presetName}.`;
    case 'ready':
      return `Sky from the record: ${status.yearsReady} past years${forecast}`;
    case 'unavailable':
      return `Weather record unavailable just now: the sky is assumed ${presetName}${forecast}`;
    case 'off':
      return `Weather records are off on this server: the sky is assumed ${presetName}${forecast}`;
  }
}
