/** The compressed forms the server keeps ready (Brotli and gzip); anything else is sent as it is. */
export type EncodingName = 'br' | 'gzip';

/**
 * The best ready-made encoding a client accepts: the highest q value it gives, Brotli when it rates both alike
 * (browsers list gzip first but Brotli is the smaller). Undefined when it accepts neither.
 */
export function pickEncoding(
  acceptEncoding: string | undefined,
  available: readonly EncodingName[],
): EncodingName | undefined {
  const quality = new Map<string, number>();
  for (const part of (acceptEncoding ?? '').split(',')) {
    const [token = '', ...params] = part.trim().split(';');
    const q = params.map((p) => /^\s*q=([\d.]+)\s*$/.exec(p)?.[1]).find((v) => v !== undefined);
    if (token) quality.set(token.toLowerCase(), q === undefined ? 1 : Number(q));
  }
  let best: EncodingName | undefined;
  let bestQ = 0;
  for (const name of available) {
    const q = quality.get(name) ?? quality.get('*') ?? 0;
    if (q > bestQ) {
      best = name;
      bestQ = q;
    }
  }
  return best;
}
