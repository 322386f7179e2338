import express from 'express';
import { z } from 'zod';

import { isoDateInTimeZone } from '@/shared/money';
import {
  idParamsSchema,
  workCreateSchema,
  workExportQuerySchema,
  workListQuerySchema,
  workUpdateSchema,
} from '@/shared/schemas/work';
import { workImportRequestSchema } from '@/shared/schemas/work-import';

import { requireRole, scopeOf } from '../access/authenticate';
import { type AppContext } from '../context';
import { validate } from '../http/validate';
import { writeBody } from '../http/write-body';
import { photoStore } from '../photos/photo-store';
import { getStudio } from '../studio/studio.service';
import { importTemplateCsv } from './import/import-template';
import { commitImport, previewImport } from './import/works-import.service';
import { getWorkHistory } from './work-history.repository';
import { listFacets } from './works.repository';
import {
  createWork,
  deleteWork,
  exportWorksCsv,
  getWork,
  listWorks,
  setArchived,
  updateWork,
} from './works.service';

const noInput = validate({ query: z.strictObject({}) });
const list = validate({ query: workListQuerySchema });
const exportCsv = validate({ query: workExportQuerySchema });
const importCsv = validate({ body: workImportRequestSchema });
const create = validate({ body: workCreateSchema });
const byId = validate({ params: idParamsSchema });
const update = validate({ params: idParamsSchema, body: workUpdateSchema });

/** `/api/works`: the studio's catalogue, for the studio roles only (it carries cost prices). */
export function worksRouter({ db, filesDir }: AppContext) {
  const store = photoStore(filesDir);
  return (
    express
      .Router()
      .use(requireRole('owner', 'assistant'))
      .get('/', list, async (_req, res) => {
        res.json(await listWorks(db, scopeOf(res), list.input(res).query));
      })
      .get('/facets', noInput, async (_req, res) => {
        res.json(await listFacets(db, scopeOf(res)));
      })
      .get('/export.csv', exportCsv, async (_req, res) => {
        const scope = scopeOf(res);
        const query = exportCsv.input(res).query;
        const studio = await getStudio(db, scope);
        const day = isoDateInTimeZone(new Date(), studio.time_zone);
        res
          .type('text/csv; charset=utf-8')
          .attachment(`works-${day}.csv`)
          .set('Cache-Control', 'no-store');
        // The byte-order mark tells spreadsheet programs the file is UTF-8.
        await writeBody(res, '\ufeff');
        await exportWorksCsv(db, scope, query, (chunk) => writeBody(res, chunk));
        res.end();
      })
      .get('/import/template.csv', noInput, async (_req, res) => {
        const studio = await getStudio(db, scopeOf(res));
        res
          .type('text/csv; charset=utf-8')
          .attachment('works-import-template.csv')
          .set('Cache-Control', 'no-store')
          // The byte-order mark tells spreadsheet programs the file is UTF-8.
          .send(`\ufeff${importTemplateCsv(studio.currency)}`);
      })
      .post('/import', importCsv, async (_req, res) => {
        const request = importCsv.input(res).body;
        const scope = scopeOf(res);
        res.json(
          request.mode === 'preview'
            ? await previewImport(db, scope, request)
            : await commitImport(db, scope, request),
        );
      })
      .post('/', create, async (_req, res) => {
        res.status(201).json(await createWork(db, scopeOf(res), create.input(res).body));
      })
      // Fixed paths come before `/:id`, or they would be read as ids.
      .get('/:id', byId, async (_req, res) => {
        res.json(await getWork(db, scopeOf(res), byId.input(res).params.id));
      })
      .patch('/:id', update, async (_req, res) => {
        const { params, body } = update.input(res);
        res.json(await updateWork(db, scopeOf(res), params.id, body));
      })
      .post('/:id/archive', byId, async (_req, res) => {
        res.json(await setArchived(db, scopeOf(res), byId.input(res).params.id, true));
      })
      .post('/:id/restore', byId, async (_req, res) => {
        res.json(await setArchived(db, scopeOf(res), byId.input(res).params.id, false));
      })
      .delete('/:id', byId, async (_req, res) => {
        await deleteWork(db, store, scopeOf(res), byId.input(res).params.id);
        res.status(204).end();
      })
      .get('/:id/history', byId, async (_req, res) => {
        const { id } = byId.input(res).params;
        await getWork(db, scopeOf(res), id);
        res.json(await getWorkHistory(db, scopeOf(res), id));
      })
  );
}
