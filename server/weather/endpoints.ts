/** The public keyless services: an hourly reanalysis archive from 1940, and a 16-day hourly forecast. */
export const PUBLIC_ARCHIVE_URL = 'https://archive-api.open-meteo.com/v1/archive';
export const PUBLIC_FORECAST_URL = 'https://api.open-meteo.com/v1/forecast';

/** Where the server fetches weather from; null: that kind is not fetched. */
export type WeatherEndpoints = { archiveUrl: string | null; forecastUrl: string | null };

type Configured = { WEATHER_API_URL?: string | undefined; WEATHER_FORECAST_URL?: string | undefined };

/** Whether a local fake must be started: outside production, any endpoint left unset goes to it. */
export function needsLocalWeather(env: Configured, production: boolean): boolean {
  return !production && (env.WEATHER_API_URL === undefined || env.WEATHER_FORECAST_URL === undefined);
}

/**
 * Each endpoint: `off` fetches nothing, a URL is used as it is, unset is the public service in production and the
 * local fake otherwise.
 */
export function weatherEndpoints(
  env: Configured,
  production: boolean,
  fake: { archiveUrl: string; forecastUrl: string } | undefined,
): WeatherEndpoints {
  const pick = (value: string | undefined, publicUrl: string, fakeUrl: string | undefined): string | null => {
    if (value === 'off') return null;
    if (value !== undefined) return value;
    if (production) return publicUrl;
    return fakeUrl ?? null;
  };
  return {
    archiveUrl: pick(env.WEATHER_API_URL, PUBLIC_ARCHIVE_URL, fake?.archiveUrl),
    forecastUrl: pick(env.WEATHER_FORECAST_URL, PUBLIC_FORECAST_URL, fake?.forecastUrl),
  };
}
