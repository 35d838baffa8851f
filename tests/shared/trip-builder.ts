// Small builders for synthetic engine inputs used by the engine tests.
import type { ApplianceInput } from '@/shared/schemas';
import type { EngineInputDraft } from '@/shared/schemas';

export type SimpleTrip = {
  lat?: number;
  lon?: number;
  zone?: string;
  arrive?: string;
  depart?: string;
  capacityAh?: number;
  solarW?: number;
  exposure?: 'open' | 'light-cover' | 'partial-shade' | 'deep-forest';
  sky?: 'clear' | 'hazy' | 'broken-cloud' | 'overcast';
  appliances?: ApplianceInput[];
  initialSocPct?: number;
  inverter?: boolean;
  lowC?: number;
  highC?: number;
  controllerAmps?: number;
};

export function simpleTrip(o: SimpleTrip = {}): EngineInputDraft {
  const solar = (o.solarW ?? 0) > 0;
  return {
    trip: {
      name: 'Test trip',
      stops: [
        {
          name: 'Test site',
          lat: o.lat ?? 45,
          lon: o.lon ?? 0,
          timeZone: o.zone ?? 'UTC',
          arriveAt: o.arrive ?? '2027-06-21T00:00Z',
          departAt: o.depart ?? '2027-06-22T00:00Z',
          exposure: { kind: 'preset', preset: o.exposure ?? 'open' },
          skyOutlook: o.sky ?? 'clear',
          lowC: o.lowC ?? 15,
          highC: o.highC ?? 25,
        },
      ],
      drives: [],
    },
    rig: {
      name: 'Test rig',
      battery: {
        chemistry: 'lifepo4',
        capacityAh: o.capacityAh ?? 100,
        nominalV: 12.8,
        initialSocPct: o.initialSocPct ?? 100,
        reservePct: 20,
      },
      solarArrays: solar ? [{ ratedW: o.solarW ?? 0, mounting: 'flat', fit: 'racked' }] : [],
      controller: solar ? { kind: 'mppt', maxAmps: o.controllerAmps ?? 500 } : null,
      inverter: o.inverter ? { ratedW: 2000, efficiency: 0.9, idleW: 0 } : null,
    },
    appliances: o.appliances ?? [],
    options: { skyBand: false },
  };
}

export function constantLoad(id: string, circuit: 'ac' | 'dc', w: number): ApplianceInput {
  return { id, name: id, circuit, runningW: w, schedule: { kind: 'always' } };
}
