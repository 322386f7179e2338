import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';

import request from 'supertest';

import { pdfPagePng, pdfPages, requirePoppler, squash } from '../../documents/helpers/pdf';
import { as } from '../helpers/consignment-fixture';
import { gbp, issuedStatementFixture } from '../helpers/two-sales-fixture';

beforeAll(requirePoppler);

describe('GET /api/statements/:id.pdf', () => {
  it('prints every sale, the totals, the balance, the pay link and the VAT caution', async () => {
    const { f, owner, statement } = await issuedStatementFixture();
    await owner.post(`/api/statements/${statement.id}/payments`, {
      amount: gbp(10_000),
      receivedOn: statement.issuedAt.slice(0, 10),
      method: 'bank-transfer',
      reference: statement.reference,
    });
    const res = await request(f.app)
      .get(`/api/statements/${statement.id}.pdf`)
      .set('Cookie', await f.cookie('owner'));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/pdf');
    const text = squash(pdfPages(res.body).join('\n'));
    // 40% commission on £90 and £240 (£36 + £96), VAT at 20% on it (£7.20 + £19.20, HMRC
    // standard rate); the maker's shares £46.80 + £124.80 = £171.60, less £100 paid.
    for (const figure of ['£330.00', '£132.00', '£26.40', '£171.60', '£100.00', '£71.60']) {
      expect(text).toContain(figure);
    }
    expect(text).toContain(statement.reference);
    expect(text).toContain('/venue/statements/');
    expect(text).toContain('HMRC or an accountant');
    const out = path.resolve(__dirname, '../../../test-results/documents');
    mkdirSync(out, { recursive: true });
    writeFileSync(path.join(out, 'statement-page-1.png'), pdfPagePng(res.body, 1, 100));
  });

  it('is 404 to another studio', async () => {
    const { f, statement } = await issuedStatementFixture();
    const res = await as(f, 'otherOwner').get(`/api/statements/${statement.id}.pdf`);
    expect(res.status).toBe(404);
  });
});
