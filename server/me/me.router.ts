import express from 'express';

import { activeMembershipRequestSchema, type Me } from '@/shared/schemas/session';

import { requireSignedIn, viewerOf } from '../access/authenticate';
import { setActiveMembershipId } from '../access/sessions.repository';
import { type Viewer } from '../access/viewer';
import { type AppContext } from '../context';
import { HttpError } from '../http/http-error';
import { validate } from '../http/validate';

const toMe = (viewer: Viewer): Me => ({
  user: viewer.user,
  memberships: viewer.memberships,
  activeMembershipId: viewer.active?.id ?? null,
});

const chooseMembership = validate({ body: activeMembershipRequestSchema });

export function meRouter({ db }: AppContext) {
  return express
    .Router()
    .use(requireSignedIn)
    .get('/', (_req, res) => {
      res.json(toMe(viewerOf(res)));
    })
    .put('/active-membership', chooseMembership, async (_req, res) => {
      const viewer = viewerOf(res);
      const { membershipId } = chooseMembership.input(res).body;
      const chosen = viewer.memberships.find((m) => m.id === membershipId);
      // Someone else's membership is as unknown as one that does not exist.
      if (!chosen) throw new HttpError('not_found', 'That membership was not found.');
      await setActiveMembershipId(db, viewer.sessionId, chosen.id);
      res.json(toMe({ ...viewer, active: chosen }));
    });
}
