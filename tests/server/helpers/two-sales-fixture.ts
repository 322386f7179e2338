import { as, consignmentFixture, dispatchedWith } from './consignment-fixture';

export const gbp = (amount: number) => ({ amount, currency: 'GBP' });

/**
 * Venue A's show with two of its three pieces sold today by the venue's staff: £90 (a discount
 * from £100, with its reason) and £240, under venue A's terms (40% commission, VAT at 20% added).
 */
export async function twoSalesFixture() {
  const f = await consignmentFixture();
  const owner = as(f, 'owner');
  const gallery = as(f, 'gallery');
  const show = await dispatchedWith(f, f.works);
  const today = (await owner.get(`/api/consignments/${show.id}`)).body.today as string;
  await gallery.post(`/api/consignment-lines/${show.lines[0]!.id}/sale`, {
    soldOn: today,
    salePrice: gbp(9_000),
    discountReason: 'Returning customer',
  });
  await gallery.post(`/api/consignment-lines/${show.lines[1]!.id}/sale`, {
    soldOn: today,
    salePrice: gbp(24_000),
  });
  return { f, owner, gallery, show, today };
}

/** The same, with the show's statement made and issued. */
export async function issuedStatementFixture() {
  const fixture = await twoSalesFixture();
  const draft = await fixture.owner.post('/api/statements', { consignmentId: fixture.show.id });
  const issued = await fixture.owner.post(`/api/statements/${draft.body.id}/issue`);
  return {
    ...fixture,
    statement: issued.body as { id: number; reference: string; issuedAt: string },
  };
}
