import { create as contentDisposition } from 'content-disposition';
import express from 'express';

import { consignmentParamsSchema, lineOnlyParamsSchema } from '@/shared/schemas/consignment';

import { requireRole, scopeOf } from '../access/authenticate';
import { requireAnyRole, requireScopeOf } from '../access/resource-scope';
import { studioOf } from '../access/resource-studio.repository';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { photoStore } from '../photos/photo-store';
import { renderClaimDocument } from './claim-document';
import { type DocumentKind, renderConsignmentDocument } from './documents.service';

const byId = validate({ params: consignmentParamsSchema });
const roles = ['owner', 'assistant', 'gallery'] as const;
const studio = requireRole('owner', 'assistant');
const byLine = validate({ params: lineOnlyParamsSchema });

/** The path under a consignment where each of its PDFs is served. */
const documentPaths: Record<DocumentKind, string> = {
  'consignment-sheet': '/:id/sheet.pdf',
  'condition-report': '/:id/condition-report.pdf',
  labels: '/:id/labels.pdf',
};

/**
 * `/api/consignments/:id/*.pdf`: a consignment's documents, made from its current data for
 * anyone who may see the consignment, shown in the browser and saved under a telling name.
 */
export function documentsRouter({ db, filesDir, appUrl }: AppContext) {
  const store = photoStore(filesDir);
  const router = express.Router();
  // The consignment's own studio: a venue's staff print a maker's documents without switching.
  const consignmentScope = requireScopeOf(
    db,
    'That consignment',
    (d, res) => studioOf.consignment(d, byId.input(res).params.id),
    ...roles,
  );
  for (const [kind, path] of Object.entries(documentPaths) as [DocumentKind, string][]) {
    router.get(path, requireAnyRole(...roles), byId, consignmentScope, async (_req, res) => {
      const { id } = byId.input(res).params;
      const document = await renderConsignmentDocument(db, store, scopeOf(res), id, kind, {
        appUrl,
      });
      res.type('application/pdf');
      res.set('Content-Disposition', contentDisposition(document.fileName, { type: 'inline' }));
      res.set('Cache-Control', 'private, no-store');
      res.send(document.bytes);
    });
  }
  return router;
}

/** `/api/consignment-lines/:lineId/claim.pdf`: the damage claim summary of a returned piece. */
export function lineDocumentsRouter({ db, filesDir }: AppContext) {
  const store = photoStore(filesDir);
  return express
    .Router({ mergeParams: true })
    .get('/claim.pdf', studio, byLine, async (_req, res) => {
      const { lineId } = byLine.input(res).params;
      const document = await renderClaimDocument(db, store, scopeOf(res), lineId);
      res.type('application/pdf');
      res.set('Content-Disposition', contentDisposition(document.fileName, { type: 'inline' }));
      res.set('Cache-Control', 'private, no-store');
      res.send(document.bytes);
    });
}
