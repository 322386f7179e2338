import { fromNodeHeaders } from 'better-auth/node';
import { type RequestHandler, type Response } from 'express';

import { type Membership, type Role } from '@/shared/schemas/membership';

import { type AppContext } from '../context';
import { HttpError } from '../http/http-error';
import { listMembershipsOfUser } from '../memberships/memberships.repository';
import { getActiveMembershipId } from './sessions.repository';
import { type Scope, scopeFor, type Viewer } from './viewer';

declare module 'express-serve-static-core' {
  interface Locals {
    viewer?: Viewer | null;
    scope?: Scope;
  }
}

/**
 * Resolves the session cookie into a Viewer (or null) for every API request. The active
 * membership is the one stored on the session, or the only one there is.
 */
export function authenticate({ auth, db }: AppContext): RequestHandler {
  return async (req, res, next) => {
    const session = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
    if (!session) {
      res.locals.viewer = null;
      return next();
    }
    const memberships = await listMembershipsOfUser(db, session.user.id);
    const storedId = await getActiveMembershipId(db, session.session.id);
    const active =
      memberships.find((m) => m.id === storedId) ??
      (memberships.length === 1 ? memberships[0]! : null);
    res.locals.viewer = {
      user: { id: session.user.id, name: session.user.name, email: session.user.email },
      sessionId: session.session.id,
      memberships,
      active,
    };
    next();
  };
}

export function viewerOf(res: Response): Viewer {
  const viewer = res.locals.viewer;
  if (!viewer) throw new HttpError('unauthenticated', 'Sign in to continue.');
  return viewer;
}

export const requireSignedIn: RequestHandler = (_req, res, next) => {
  viewerOf(res);
  next();
};

/**
 * Lets the request through only for an active membership with one of `roles`, and fixes the
 * Scope that every query of the route uses.
 */
export function requireRole(...roles: Role[]): RequestHandler {
  return (_req, res, next) => {
    const viewer = viewerOf(res);
    const active: Membership | null = viewer.active;
    if (!active) {
      throw new HttpError('forbidden', 'Choose which studio to work in first.');
    }
    if (!roles.includes(active.role)) {
      throw new HttpError('forbidden', 'Your role in this studio does not allow this.');
    }
    res.locals.scope = scopeFor({ ...viewer, active });
    next();
  };
}

export function scopeOf(res: Response): Scope {
  const scope = res.locals.scope;
  if (!scope) throw new Error('scopeOf called on a route without requireRole');
  return scope;
}
