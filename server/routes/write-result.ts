import type { VersionedWrite } from '@/db/queries/stops';
import { conflict, notFound } from '../errors';

/** Unwraps a versioned write: a stale version is a 409 carrying the current record. */
export function unwrapWrite<T, R>(result: VersionedWrite<T>, toRecord: (row: T) => R, what: string): R {
  if (result.status === 'missing') throw notFound(`That ${what} was not found.`);
  if (result.status === 'conflict') throw conflict(toRecord(result.current));
  return toRecord(result.row);
}
