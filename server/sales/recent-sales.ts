import { splitSale } from '@/shared/money';
import { type Overview } from '@/shared/schemas/overview';

import { type Scope } from '../access/viewer';
import { termsOf } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { listRecentSales } from './sales.repository';

/** The studio's latest sales for the overview, each with the maker's share by the money engine. */
export async function recentSales(db: Db, scope: Scope): Promise<Overview['recentSales']> {
  const rows = await listRecentSales(db, scope, 8);
  return rows.map((r) => {
    const price = { amount: r.sale_price!, currency: r.currency };
    const split = splitSale(termsOf(r), { amount: r.list_price, currency: r.currency }, price);
    return {
      lineId: r.id,
      consignmentId: r.consignment_id,
      reference: r.reference,
      venueName: r.venue_name,
      stockNumber: r.stock_number,
      title: r.title,
      soldOn: r.sold_on!,
      price,
      makerShare: split.makerShare,
      enteredBy: r.sale_entered_by ?? 'studio',
    };
  });
}
