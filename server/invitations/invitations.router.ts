import express from 'express';

import { invitationAcceptSchema, invitationLookupQuerySchema } from '@/shared/schemas/invitation';

import { passToAuthSignIn } from '../auth/auth-response';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { acceptInvitation, lookupInvitation } from './invitations.service';

const lookup = validate({ query: invitationLookupQuerySchema });
const accept = validate({ body: invitationAcceptSchema });

/**
 * `/api/invitations`: open to anyone holding a link; the token admits them. Accepting signs the
 * person in, so the link leads straight to the venue's side.
 */
export function invitationsRouter(context: AppContext) {
  return express
    .Router()
    .get('/lookup', lookup, async (_req, res) => {
      res.json(await lookupInvitation(context.db, lookup.input(res).query.token));
    })
    .post('/accept', accept, async (req, res) => {
      const { body } = accept.input(res);
      const email = await acceptInvitation(context.db, body);
      await passToAuthSignIn(context, req, res, { email, password: body.password });
    });
}
