import { formatDate } from '@/shared/format/dates';
import { formatMoney, sumMoney } from '@/shared/money';
import { type Money } from '@/shared/schemas/money';

import { mailLayout } from './layout';

export type SaleNoticeItem = {
  stockNumber: string;
  title: string;
  venueName: string;
  reference: string;
  soldOn: string;
  price: Money;
  listPrice: Money;
  discountReason: string | null;
  commission: Money;
  vatOnCommission: Money;
  makerShare: Money;
  /** Who recorded it: the venue's staff member, or "the studio" for one phoned in. */
  recordedBy: string;
  imageCid: string | null;
};

export type SaleNoticeData = {
  studioName: string;
  items: readonly SaleNoticeItem[];
  locale: string;
  /** The studio's consignments page. */
  url: string;
};

const piecesWord = (n: number) => `${n} ${n === 1 ? 'piece' : 'pieces'}`;

function itemText(item: SaleNoticeItem, locale: string) {
  const money = (m: Money) => formatMoney(m, locale);
  const discounted = item.price.amount < item.listPrice.amount;
  return [
    `${item.stockNumber} ${item.title}`,
    `Sold at ${item.venueName} on ${formatDate(item.soldOn, locale)} for ${money(item.price)}` +
      (discounted
        ? ` (list price ${money(item.listPrice)}${item.discountReason ? `; ${item.discountReason}` : ''})`
        : '') +
      '.',
    `Commission ${money(item.commission)}` +
      (item.vatOnCommission.amount > 0
        ? `, VAT on commission ${money(item.vatOnCommission)}`
        : '') +
      `; your share ${money(item.makerShare)}.`,
    `${item.reference}, recorded by ${item.recordedBy}.`,
  ].join('\n');
}

/**
 * Tells the maker what sold: one piece, or several recorded within a few minutes of each other,
 * each with its photo, price and split.
 */
export function saleNoticeMail(data: SaleNoticeData) {
  const { items, locale } = data;
  const first = items[0]!;
  const venues = [...new Set(items.map((i) => i.venueName))];
  const where = venues.length === 1 ? venues[0]! : `${venues.length} venues`;
  const currencies = [...new Set(items.map((i) => i.price.currency))];
  const total = (pick: (i: SaleNoticeItem) => Money) =>
    currencies.map((c) =>
      formatMoney(sumMoney(items.filter((i) => i.price.currency === c).map(pick), c), locale),
    );
  const subject =
    items.length === 1
      ? `Sold at ${where}: ${first.stockNumber} ${first.title}, ${formatMoney(first.price, locale)}`
      : `${piecesWord(items.length)} sold at ${where}: ${total((i) => i.price).join(' and ')}`;
  const heading =
    items.length === 1 ? `${first.title} has sold` : `${piecesWord(items.length)} sold`;
  return {
    subject,
    ...mailLayout({
      heading,
      paragraphs: [
        items.length === 1
          ? `${where} recorded a sale of your work. Your share is ${formatMoney(first.makerShare, locale)}, paid with the consignment’s statement.`
          : `${where} recorded these sales: ${total((i) => i.price).join(' and ')} in all, of which your share is ${total((i) => i.makerShare).join(' and ')}, paid with the consignments’ statements.`,
      ],
      items: items.map((item) => ({
        text: itemText(item, locale),
        imageCid: item.imageCid,
        alt: `${item.stockNumber} ${item.title}`,
      })),
      action: { label: 'Open your consignments', url: data.url },
      footer: `Saggar sends this to the owner of ${data.studioName} when a venue, or the studio, records a sale. The figures follow the consignment’s agreed terms; the statement is the account to rely on.`,
    }),
  };
}
