import express from 'express';

import {
  acknowledgeSchema,
  consignmentCreateSchema,
  consignmentListQuerySchema,
  consignmentParamsSchema,
  consignmentUpdateSchema,
  lineCreateSchema,
  lineParamsSchema,
  lineUpdateSchema,
} from '@/shared/schemas/consignment';

import { requireRole, scopeOf } from '../access/authenticate';
import { requireAnyRole, requireScopeOf } from '../access/resource-scope';
import { studioOf } from '../access/resource-studio.repository';
import { type Scope } from '../access/viewer';
import { type AppContext } from '../context';
import { HttpError } from '../http/http-error';
import { validate } from '../http/validate';
import {
  createConsignment,
  getConsignment,
  listConsignments,
  updateConsignment,
} from './consignments.service';
import {
  acknowledgeConsignment,
  agreeConsignment,
  cancelConsignment,
  closeConsignment,
  dispatchConsignment,
} from './lifecycle.service';
import { addLine, removeLine, updateLinePrice } from './lines.service';

const list = validate({ query: consignmentListQuerySchema });
const create = validate({ body: consignmentCreateSchema });
const byId = validate({ params: consignmentParamsSchema });
const update = validate({ params: consignmentParamsSchema, body: consignmentUpdateSchema });
const addPiece = validate({ params: consignmentParamsSchema, body: lineCreateSchema });
const priceLine = validate({ params: lineParamsSchema, body: lineUpdateSchema });
const byLine = validate({ params: lineParamsSchema });
const acknowledge = validate({ params: consignmentParamsSchema, body: acknowledgeSchema });

const anyone = requireRole('owner', 'assistant', 'gallery');
const studio = requireRole('owner', 'assistant');
const anyVenue = requireAnyRole('gallery');

/** Terms are the owner's to set (docs/domain.md, roles), here as on a venue. */
function checkTermsAllowed(scope: Scope, body: { terms?: unknown }) {
  if (body.terms !== undefined && scope.role !== 'owner') {
    throw new HttpError('forbidden', 'Only the studio’s owner can set a consignment’s terms.');
  }
}

/** `/api/consignments`: batches of work sent to a venue, and their life until they are sent. */
export function consignmentsRouter({ db, appUrl }: AppContext) {
  // The consignment's own studio: a venue's staff acknowledge any maker's work without switching.
  const acknowledgeScope = requireScopeOf(
    db,
    'That consignment',
    (d, res) => studioOf.consignment(d, acknowledge.input(res).params.id),
    'gallery',
  );
  return express
    .Router()
    .get('/', anyone, list, async (_req, res) => {
      const { state, venueId } = list.input(res).query;
      res.json(await listConsignments(db, scopeOf(res), { state, venueId }));
    })
    .post('/', studio, create, async (_req, res) => {
      const { body } = create.input(res);
      checkTermsAllowed(scopeOf(res), body);
      res.status(201).json(await createConsignment(db, scopeOf(res), body));
    })
    .get('/:id', anyone, byId, async (_req, res) => {
      res.json(await getConsignment(db, scopeOf(res), byId.input(res).params.id));
    })
    .patch('/:id', studio, update, async (_req, res) => {
      const { params, body } = update.input(res);
      checkTermsAllowed(scopeOf(res), body);
      res.json(await updateConsignment(db, scopeOf(res), params.id, body));
    })
    .post('/:id/lines', studio, addPiece, async (_req, res) => {
      const { params, body } = addPiece.input(res);
      res.status(201).json(await addLine(db, scopeOf(res), params.id, body));
    })
    .patch('/:id/lines/:lineId', studio, priceLine, async (_req, res) => {
      const { params, body } = priceLine.input(res);
      res.json(await updateLinePrice(db, scopeOf(res), params.id, params.lineId, body));
    })
    .delete('/:id/lines/:lineId', studio, byLine, async (_req, res) => {
      const { params } = byLine.input(res);
      res.json(await removeLine(db, scopeOf(res), params.id, params.lineId));
    })
    .post('/:id/agree', studio, byId, async (_req, res) => {
      res.json(await agreeConsignment(db, scopeOf(res), byId.input(res).params.id));
    })
    .post('/:id/dispatch', studio, byId, async (_req, res) => {
      res.json(await dispatchConsignment(db, scopeOf(res), byId.input(res).params.id, { appUrl }));
    })
    .post('/:id/close', studio, byId, async (_req, res) => {
      res.json(await closeConsignment(db, scopeOf(res), byId.input(res).params.id));
    })
    .post('/:id/cancel', studio, byId, async (_req, res) => {
      res.json(await cancelConsignment(db, scopeOf(res), byId.input(res).params.id));
    })
    .post('/:id/acknowledge', anyVenue, acknowledge, acknowledgeScope, async (_req, res) => {
      const { params, body } = acknowledge.input(res);
      res.json(await acknowledgeConsignment(db, scopeOf(res), params.id, body));
    });
}
