import type { TripDetail } from './schemas/api';
import type { EngineInputDraft } from './schemas/engine-input';

/**
 * The engine's input for a stored trip. The server runs it for GET /budget and the screens run
 * it for instant what-ifs, so both compute from exactly the same input.
 * Returns null while the trip has no stop yet: there is nothing to simulate. A record stored before a field existed
 * (the rig's living space, an inverter's hours, a stop's sky openness, a thermostat's efficiency) is passed on as it
 * is: the engine's schema fills the field's default, so older trips keep running.
 */
export function toEngineInput(
  detail: Pick<TripDetail, 'trip' | 'rig' | 'stops' | 'drives' | 'appliances'>,
): EngineInputDraft | null {
  if (detail.stops.length === 0) return null;
  return {
    trip: {
      name: detail.trip.name,
      stops: detail.stops.map((record) => record.stop),
      drives: detail.drives.map((record) => record.drive),
    },
    rig: detail.rig.rig,
    appliances: detail.appliances.map((record) => ({ ...record.appliance, id: record.id })),
  };
}
