import { weatherErrorSchema, weatherResponseSchema } from '@/shared/schemas/weather';

/** One place's hourly record: UTC hour starts (ms) and, per hour, GHI (W/m², preceding hour's mean) and °C. */
export type HourlyWeather = {
  latitude: number;
  longitude: number;
  timeMs: number[];
  ghiWm2: (number | null)[];
  tempC: (number | null)[];
};

export type WeatherRequest = { lat: number; lon: number; startDate: string; endDate: string };

/** Why a fetch failed: `refused` (the service said no: asking again will not help) or `failed` (try again later). */
export class WeatherFetchError extends Error {
  constructor(
    readonly kind: 'refused' | 'failed',
    message: string,
  ) {
    super(message);
    this.name = 'WeatherFetchError';
  }
}

/** A year of hours is about 250 kB of JSON; anything far past that is not an answer to our query. */
const MAX_BODY_BYTES = 2 * 1024 * 1024;
const DEFAULT_TIMEOUT_MS = 15_000;

async function readCapped(response: Response, limit: number): Promise<string> {
  const reader = response.body?.getReader();
  if (!reader) return '';
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw new WeatherFetchError('failed', `The weather service's answer passed ${limit} bytes.`);
    }
    chunks.push(value);
  }
  return Buffer.concat(chunks).toString('utf8');
}

function parseJson(text: string): unknown {
  try {
    return JSON.parse(text) as unknown;
  } catch {
    throw new WeatherFetchError('failed', 'The weather service answered something that is not JSON.');
  }
}

/**
 * Asks a historical-weather or forecast endpoint for hourly GHI and air temperature at a place over an inclusive
 * range of UTC dates, and checks the answer's shape before anything uses it. Times out after `timeoutMs`.
 */
export async function fetchHourlyWeather(
  endpoint: string,
  request: WeatherRequest,
  options: { timeoutMs?: number } = {},
): Promise<HourlyWeather> {
  const url = new URL(endpoint);
  url.searchParams.set('latitude', request.lat.toFixed(4));
  url.searchParams.set('longitude', request.lon.toFixed(4));
  url.searchParams.set('start_date', request.startDate);
  url.searchParams.set('end_date', request.endDate);
  url.searchParams.set('hourly', 'shortwave_radiation,temperature_2m');
  url.searchParams.set('timezone', 'UTC');
  let response: Response;
  let text: string;
  try {
    const signal = AbortSignal.timeout(options.timeoutMs ?? DEFAULT_TIMEOUT_MS);
    response = await fetch(url, { signal, headers: { accept: 'application/json' } });
    text = await readCapped(response, MAX_BODY_BYTES);
  } catch (error) {
    if (error instanceof WeatherFetchError) throw error;
    const timedOut = error instanceof Error && (error.name === 'TimeoutError' || error.name === 'AbortError');
    throw new WeatherFetchError(
      'failed',
      timedOut ? 'The weather service did not answer in time.' : 'The weather service could not be reached.',
    );
  }
  if (response.status === 400) {
    const refusal = weatherErrorSchema.safeParse(parseJson(text));
    throw new WeatherFetchError(
      'refused',
      refusal.success ? `The weather service refused: ${refusal.data.reason}` : 'The weather service refused.',
    );
  }
  if (!response.ok) throw new WeatherFetchError('failed', `The weather service answered ${response.status}.`);
  const parsed = weatherResponseSchema.safeParse(parseJson(text));
  if (!parsed.success) throw new WeatherFetchError('failed', 'The weather service answered in an unexpected shape.');
  const { hourly } = parsed.data;
  return {
    latitude: parsed.data.latitude,
    longitude: parsed.data.longitude,
    timeMs: hourly.time.map((t) => Date.parse(`${t}:00Z`)),
    ghiWm2: hourly.shortwave_radiation,
    tempC: hourly.temperature_2m,
  };
}
