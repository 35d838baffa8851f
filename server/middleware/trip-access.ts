import type { NextFunction, Request, Response } from 'express';
import { z } from 'zod';
import type { Db } from '@/db/client';
import { sharedToUserClub } from '@/db/queries/clubs';
import { findMembership } from '@/db/queries/trips';
import { can, type Permission, type Role } from '@/shared/schemas/roles';
import { HttpError, notFound } from '../errors';
import { currentUser } from './require-session';

/** `viaClub`: the caller is no member and reads the trip because it is shared to one of their clubs. */
export type TripAccess = { tripId: string; role: Role; userId: string; viaClub: boolean };

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/consistent-type-definitions -- declaration merging needs an interface
    interface Locals {
      access?: TripAccess;
    }
  }
}

export const idParam = z.string().min(1).max(64);

/** A member's role; a trip shared to one of the user's clubs reads as viewer. */
export function resolveAccess(db: Db, tripId: string, userId: string): { role: Role; viaClub: boolean } | undefined {
  const membership = findMembership(db, tripId, userId);
  if (membership) return { role: membership.role, viaClub: false };
  return sharedToUserClub(db, tripId, userId) ? { role: 'viewer', viaClub: true } : undefined;
}

/**
 * Resolves the signed-in user's role on :tripId. Someone who may not read it gets the same 404 as
 * for a trip that does not exist, so a trip's existence never leaks.
 */
export function loadTripAccess(db: Db) {
  return (req: Request, res: Response, next: NextFunction) => {
    const user = currentUser(res);
    const tripId = idParam.safeParse(req.params.tripId);
    const access = tripId.success ? resolveAccess(db, tripId.data, user.id) : undefined;
    if (!tripId.success || !access) throw notFound('That trip was not found.');
    res.locals.access = { tripId: tripId.data, userId: user.id, ...access };
    next();
  };
}

const REFUSALS: Record<Permission, string> = {
  read: 'You cannot see this trip.',
  editLoads: 'Only crew, planners and the owner can change appliances and routines.',
  editTrip: 'Only planners and the owner can change the trip, its stops, drives and rig.',
  manageMembers: 'Only the owner can manage members.',
  deleteTrip: 'Only the owner can delete the trip.',
};

/** Lets a member through only when their role carries the permission; otherwise 403. */
export function requirePermission(permission: Permission) {
  return (_req: Request, res: Response, next: NextFunction) => {
    if (!can(tripAccess(res).role, permission)) throw new HttpError(403, 'forbidden', REFUSALS[permission]);
    next();
  };
}

export function tripAccess(res: Response): TripAccess {
  const access = res.locals.access;
  if (!access) throw notFound('That trip was not found.');
  return access;
}
