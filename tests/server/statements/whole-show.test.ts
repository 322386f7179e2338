import request from 'supertest';

import { pdfPages, squash } from '../../documents/helpers/pdf';
import { as, consignmentFixture, dispatchedWith } from '../helpers/consignment-fixture';

const gbp = (amount: number) => ({ amount, currency: 'GBP' });

/**
 * A show from sending to settled, through the API. Venue A's terms (tests/server/helpers): 40%
 * commission on the price paid, VAT added on the commission at the UK standard rate of 20% (HMRC,
 * "VAT rates"), the maker not registered for VAT, discounts shared.
 */
describe('a whole show through the API', () => {
  it('sends, sells, takes a return, closes, states, is paid in part and in full, and settles', async () => {
    const f = await consignmentFixture();
    const owner = as(f, 'owner');
    const gallery = as(f, 'gallery');
    const show = await dispatchedWith(f, f.works);
    const [first, second, third] = show.lines;
    const today = (await owner.get(`/api/consignments/${show.id}`)).body.today as string;

    // A-1 (list £100) sold for £90 with a discount; A-2 (list £240) at its list price.
    const discounted = await gallery.post(`/api/consignment-lines/${first!.id}/sale`, {
      soldOn: today,
      salePrice: gbp(9_000),
      discountReason: 'Ten per cent for a returning customer',
    });
    expect(discounted.status).toBe(201);
    // 40% of £90 = £36.00; 20% VAT on it = £7.20; the maker keeps £90 − £36 − £7.20 = £46.80.
    expect(discounted.body.split).toMatchObject({
      commission: gbp(3_600),
      vatOnCommission: gbp(720),
      makerShare: gbp(4_680),
    });
    const full = await gallery.post(`/api/consignment-lines/${second!.id}/sale`, {
      soldOn: today,
      salePrice: gbp(24_000),
    });
    // 40% of £240 = £96.00; 20% VAT = £19.20; the maker keeps £124.80.
    expect(full.body.split).toMatchObject({
      commission: gbp(9_600),
      vatOnCommission: gbp(1_920),
      makerShare: gbp(12_480),
    });
    for (const s of [discounted.body.split, full.body.split]) {
      // The parts of every sale add up to its price (VAT added on top of the commission).
      expect(s.commission.amount + s.vatOnCommission.amount + s.makerShare.amount).toBe(
        s === full.body.split ? 24_000 : 9_000,
      );
    }

    // Closing with A-3 still out is refused, naming it.
    const early = await owner.post(`/api/consignments/${show.id}/close`);
    expect(early.status).toBe(409);
    expect(early.body.error.message).toContain(third!.stockNumber);

    const returned = await gallery.post(`/api/consignment-lines/${third!.id}/resolve`, {
      state: 'returned',
      on: today,
      note: 'Collected by the maker',
    });
    expect(returned.status).toBe(200);
    // Back in the studio, a chip the dispatch check did not have: new damage, at the venue, where
    // venue A's terms have the venue insure it, for its insurance value (the maker's net).
    const back = await owner.post(`/api/consignment-lines/${third!.id}/condition-reports`, {
      stage: 'return',
      examinerName: 'Ines',
      examinedOn: today,
      findings: [{ kind: 'chip', grade: 'marked', location: 'rim', sizeMm: 4 }],
    });
    expect(back.status).toBe(201);
    const returnedLine = (await owner.get(`/api/consignments/${show.id}`)).body.lines.find(
      (l: { id: number }) => l.id === third!.id,
    );
    expect(returnedLine.newDamage).toMatchObject({
      where: 'at-venue',
      insuredBy: 'venue',
      // A-3 is listed at £480: the maker's net after 40% commission is £288 (docs/money-rules.md).
      insuranceValue: gbp(28_800),
    });
    expect(returnedLine.newDamage.differences).toHaveLength(1);
    const claim = await request(f.app)
      .get(`/api/consignment-lines/${third!.id}/claim.pdf`)
      .set('Cookie', await f.cookie('owner'));
    expect(claim.status).toBe(200);
    const claimText = squash(pdfPages(claim.body).join('\n'));
    expect(claimText).toContain('New since dispatch: Chip, marked, rim, 4 mm');
    expect(claimText).toContain('£288.00');
    expect(claimText).toContain('where the agreed terms have the venue insure it');
    // The gallery's staff cannot download the maker's claim.
    expect((await gallery.get(`/api/consignment-lines/${third!.id}/claim.pdf`)).status).toBe(403);
    const closed = await owner.post(`/api/consignments/${show.id}/close`);
    expect(closed.status).toBe(200);
    expect(closed.body.state).toBe('closed');

    const draft = await owner.post('/api/statements', { consignmentId: show.id });
    expect(draft.status).toBe(201);
    expect(draft.body.state).toBe('draft');
    expect(draft.body.lines).toHaveLength(2);
    expect(draft.body.totals).toMatchObject({
      sales: gbp(33_000),
      commission: gbp(13_200),
      vatOnCommission: gbp(2_640),
      makerShare: gbp(17_160),
    });
    // The venue does not see a draft.
    expect((await gallery.get(`/api/statements/${draft.body.id}`)).status).toBe(404);

    const issued = await owner.post(`/api/statements/${draft.body.id}/issue`);
    expect(issued.status).toBe(200);
    expect(issued.body.state).toBe('issued');
    expect(issued.body.balance).toEqual(gbp(17_160));
    expect((await gallery.get(`/api/statements/${draft.body.id}`)).body.reference).toBe(
      issued.body.reference,
    );
    // Issued, the sales it covers are locked.
    const undo = await gallery.delete(`/api/consignment-lines/${first!.id}/sale`);
    expect(undo.status).toBe(409);
    expect(undo.body.error.message).toContain(issued.body.reference);

    const part = await owner.post(`/api/statements/${draft.body.id}/payments`, {
      amount: gbp(10_000),
      receivedOn: today,
      method: 'bank-transfer',
      reference: issued.body.reference,
    });
    expect(part.status).toBe(201);
    expect(part.body).toMatchObject({ state: 'issued', paid: gbp(10_000), balance: gbp(7_160) });

    // The venue pays £70 and keeps £1.60 as a card fee: the maker explains the difference.
    await owner.post(`/api/statements/${draft.body.id}/payments`, {
      amount: gbp(7_000),
      receivedOn: today,
      method: 'bank-transfer',
    });
    const explained = await owner.post(`/api/statements/${draft.body.id}/adjustments`, {
      kind: 'fee-deducted',
      amount: gbp(160),
      note: 'Card fee kept by the gallery',
    });
    expect(explained.status).toBe(201);
    expect(explained.body).toMatchObject({ state: 'settled', balance: gbp(0) });
    expect((await owner.get(`/api/consignments/${show.id}`)).body.state).toBe('settled');

    // Settled, nothing more is recorded against it.
    const late = await owner.post(`/api/statements/${draft.body.id}/payments`, {
      amount: gbp(100),
      receivedOn: today,
      method: 'cash',
    });
    expect(late.status).toBe(409);
  });
});
