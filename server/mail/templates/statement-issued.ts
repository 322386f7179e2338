import { formatDate } from '@/shared/format/dates';
import { formatMoney } from '@/shared/money';
import { type Money } from '@/shared/schemas/money';

import { mailLayout } from './layout';

export type StatementMailData = {
  studioName: string;
  venueName: string;
  contactName: string | null;
  reference: string;
  /** "C-2026-004 Midwinter table", or the period it covers. */
  covers: string;
  saleCount: number;
  sales: Money;
  balance: Money;
  dueDate: string | null;
  locale: string;
  payUrl: string;
};

/** The venue's statement: what sold, what is owed and by when, the PDF, and where to pay. */
export function statementIssuedMail(d: StatementMailData) {
  const money = (m: Money) => formatMoney(m, d.locale);
  const pieces = `${d.saleCount} ${d.saleCount === 1 ? 'piece' : 'pieces'}`;
  return {
    subject: `Statement ${d.reference} from ${d.studioName}: ${money(d.balance)} due`,
    ...mailLayout({
      heading: `Statement ${d.reference}`,
      paragraphs: [
        `${d.contactName ? `Dear ${d.contactName}` : 'Hello'},`,
        `Here is ${d.studioName}’s statement for ${d.covers}: ${pieces} sold for ${money(d.sales)} in all. After your commission, ${money(d.balance)} is due to ${d.studioName}${
          d.dueDate ? ` by ${formatDate(d.dueDate, d.locale)}` : ''
        }.`,
        'The statement is attached as a PDF, with every sale, its commission and VAT on commission. Please quote its reference with your payment, or pay online with the button below.',
      ],
      action: { label: 'Pay this statement', url: d.payUrl },
      footer: `Sent by Saggar for ${d.studioName} to ${d.venueName}. The VAT figures are guidance worked out from the agreed terms; check them with HMRC or an accountant.`,
    }),
  };
}
