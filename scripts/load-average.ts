import { loadavg } from 'node:os';

/** Medians are wall time: on a shared machine they rise with the load, so benchmarks print it beside them. */
export const loadAverage = (): string =>
  loadavg()
    .map((x) => x.toFixed(2))
    .join(' ');
