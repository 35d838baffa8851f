// Extraterrestrial irradiance with the Earth–Sun distance correction of Spencer (1971).

/** Spencer's eccentricity factor (r0/r)² for day of year n. */
export function spencerFactor(dayOfYear: number): number {
  const b = (2 * Math.PI * (dayOfYear - 1)) / 365;
  return (
    1.00011 + 0.034221 * Math.cos(b) + 0.00128 * Math.sin(b) + 0.000719 * Math.cos(2 * b) + 0.000077 * Math.sin(2 * b)
  );
}

/** Normal-incidence irradiance at the top of the atmosphere, W/m². */
export function extraterrestrialW(dayOfYear: number, solarConstantWm2: number): number {
  return solarConstantWm2 * spencerFactor(dayOfYear);
}
