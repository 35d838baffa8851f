// A calibration written (or put back): one stop's exposure and the draws of the trip's appliances, each record only
// from the version it was read at. Callers run it inside a transaction and throw on anything but 'ok', so a stale
// record leaves nothing written.
import type { SiteExposure } from '@/shared/schemas/trip';
import type { DbExecutor } from '../client';
import { findAppliance, updateAppliance } from './appliances';
import { stopFromRow } from './mappers';
import { findStopRow, updateStop } from './stops';

export type CalibrationWrite = {
  stop: { id: string; version: number; exposure: SiteExposure };
  appliances: readonly { id: string; version: number; runningW: number; standbyW: number }[];
};

export function writeCalibration(db: DbExecutor, tripId: string, write: CalibrationWrite): 'ok' | 'stale' | 'missing' {
  const stopRow = findStopRow(db, tripId, write.stop.id);
  if (!stopRow) return 'missing';
  const stop = { ...stopFromRow(stopRow), exposure: write.stop.exposure };
  const stopResult = updateStop(db, tripId, write.stop.id, write.stop.version, stop);
  if (stopResult.status !== 'ok') return stopResult.status === 'conflict' ? 'stale' : 'missing';
  for (const draw of write.appliances) {
    const record = findAppliance(db, tripId, draw.id);
    if (!record) return 'missing';
    const { id: _id, ...fields } = record.appliance;
    const result = updateAppliance(db, tripId, draw.id, draw.version, {
      fields: { ...fields, runningW: draw.runningW, standbyW: draw.standbyW },
    });
    if (result.status !== 'ok') return result.status === 'conflict' ? 'stale' : 'missing';
  }
  return 'ok';
}
