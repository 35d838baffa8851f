// Daily ambient temperature curve from a stop's low and high: a cosine with its minimum at 03:00 and its
// maximum at 15:00 local time (a common planning simplification; real minima come near sunrise).

export function ambientC(lowC: number, highC: number, localHourOfDay: number): number {
  const mean = (lowC + highC) / 2;
  const amp = (highC - lowC) / 2;
  return mean + amp * Math.cos((2 * Math.PI * (localHourOfDay - 15)) / 24);
}
