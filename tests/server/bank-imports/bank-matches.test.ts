import { as } from '../helpers/consignment-fixture';
import { gbp, issuedStatementFixture } from '../helpers/two-sales-fixture';

/** An issued statement of £171.60 owed (tests/server/helpers/two-sales-fixture.ts). */
const owedStatement = issuedStatementFixture;

describe('POST /api/bank-imports/matches', () => {
  it('reads a UK bank’s CSV and pairs each credit with the statement it pays', async () => {
    const { owner, statement } = await owedStatement();
    const csv = [
      'Date,Description,Amount,Balance',
      `04/12/2026,"GALLERY OF A ${statement.reference.toLowerCase()}",171.60,"1,171.60"`,
      '05/12/2026,CLAY SUPPLIES,-45.00,"1,126.60"',
      '06/12/2026,GALLERY OF A,171.60,"1,298.20"',
      '07/12/2026,SOMEONE ELSE,12.00,"1,310.20"',
      'not a date,X,1.00,0',
    ].join('\r\n');
    const res = await owner.post('/api/bank-imports/matches', { csv });
    expect(res.status).toBe(200);
    expect(res.body.columns).toEqual({ date: 'Date', amount: 'Amount', reference: 'Description' });
    const [byBoth, byAmount, none] = res.body.credits;
    expect(byBoth).toMatchObject({
      row: 2,
      receivedOn: '2026-12-04',
      amount: gbp(17_160),
      match: { statementId: statement.id, by: 'reference-and-amount', balance: gbp(17_160) },
    });
    expect(byAmount.match).toMatchObject({ statementId: statement.id, by: 'amount' });
    expect(none.match).toBeNull();
    expect(res.body.skipped).toEqual([
      { row: 3, reason: 'Not a credit (money paid in).' },
      { row: 6, reason: 'The date could not be read.' },
    ]);
    // Nothing is recorded until the maker confirms a match as a payment.
    expect((await owner.get(`/api/statements/${statement.id}`)).body.payments).toEqual([]);
  });

  it('remembers the columns the maker chose for the next file', async () => {
    const { owner } = await owedStatement();
    const csv = 'Posted,Money,Note\r\n2026-12-04,10.00,S-2026-001\r\n';
    const first = await owner.post('/api/bank-imports/matches', { csv });
    expect(first.body).toMatchObject({ headers: ['Posted', 'Money', 'Note'], columns: null });
    const chosen = { date: 'Posted', amount: 'Money', reference: 'Note' };
    expect(
      (await owner.post('/api/bank-imports/matches', { csv, columns: chosen })).body.columns,
    ).toEqual(chosen);
    const again = await owner.post('/api/bank-imports/matches', { csv });
    expect(again.body.columns).toEqual(chosen);
    expect(again.body.credits).toHaveLength(1);
  });

  it('refuses a column the file does not have, and anyone but the owner', async () => {
    const { f, owner } = await owedStatement();
    const csv = 'Date,Amount,Reference\r\n';
    const bad = await owner.post('/api/bank-imports/matches', {
      csv,
      columns: { date: 'Date', amount: 'Credit', reference: 'Reference' },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues).toEqual([
      { path: ['columns', 'amount'], message: 'The file has no column called “Credit”.' },
    ]);
    expect((await as(f, 'assistant').post('/api/bank-imports/matches', { csv })).status).toBe(403);
  });
});
