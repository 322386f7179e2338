import { type RequestHandler, type Response } from 'express';

import { type Role } from '@/shared/schemas/membership';

import { type Db } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { viewerOf } from './authenticate';
import { scopeFor } from './viewer';

const notAllowed = () =>
  new HttpError('forbidden', 'Your role in this studio does not allow this.');

/**
 * Lets the request through for anyone with one of `roles` in at least one studio: the first half
 * of `requireScopeOf`, before the request is parsed.
 */
export function requireAnyRole(...roles: Role[]): RequestHandler {
  return (_req, res, next) => {
    if (!viewerOf(res).memberships.some((m) => roles.includes(m.role))) throw notAllowed();
    next();
  };
}

/**
 * Fixes the Scope of a route about one resource from the resource's own studio, not the active
 * one: a gallery's staff sell a scanned piece of any maker they work for without switching
 * studio. A resource in a studio the person does not belong to is not found (never "forbidden":
 * that would say it exists); a role that may not use the route there is refused. The queries
 * that follow are scoped as usual, so a venue's staff still see only their venue's pieces.
 */
export function requireScopeOf(
  db: Db,
  what: string,
  find: (db: Db, res: Response) => Promise<number | undefined>,
  ...roles: Role[]
): RequestHandler {
  return async (_req, res, next) => {
    const viewer = viewerOf(res);
    const studioId = await find(db, res);
    const membership = viewer.memberships.find((m) => m.studioId === studioId);
    if (studioId === undefined || !membership) throw notFound(what);
    if (!roles.includes(membership.role)) throw notAllowed();
    res.locals.scope = scopeFor({ ...viewer, active: membership });
    next();
  };
}
