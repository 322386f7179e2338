import { formatDate } from '@/shared/format/dates';
import { sumMoney } from '@/shared/money/amounts';
import { formatMoney } from '@/shared/money/format';
import { type StatementDocumentData } from '@/shared/schemas/documents';
import { type Money } from '@/shared/schemas/money';

import { columns, nothing, stack, text } from './layout/boxes';
import { fileIdentifier } from './layout/identity';
import { moneyCell } from './layout/money';
import { createDocument, finishDocument } from './layout/page';
import { partiesBlock, place, sectionHeading, titleBlock } from './layout/sections';
import { type } from './layout/style';
import { drawTable } from './layout/table';

const documentName = 'Statement';

/** Totals are printed only when they are the sum of the lines they total. */
function checkTotals(data: StatementDocumentData): void {
  const { currency } = data.totals.sales;
  const check = (label: string, total: Money, parts: Money[]) => {
    const sum = sumMoney(parts, currency);
    if (sum.amount !== total.amount) {
      throw new RangeError(
        `The statement's ${label} total ${formatMoney(total)} is not the sum of its lines, ${formatMoney(sum)}.`,
      );
    }
  };
  check(
    'sales',
    data.totals.sales,
    data.lines.map((l) => l.salePrice),
  );
  check(
    'commission',
    data.totals.commission,
    data.lines.map((l) => l.commission),
  );
  check(
    'VAT on commission',
    data.totals.vatOnCommission,
    data.lines.map((l) => l.vatOnCommission),
  );
  check(
    "maker's share",
    data.totals.makerShare,
    data.lines.map((l) => l.makerShare),
  );
}

/** A caption over a figure, for the summary row. */
const figure = (label: string, value: string) =>
  stack([text(label.toLocaleUpperCase('en-GB'), type.label), text(value, type.bodyStrong)], 2);

/**
 * The statement of account a venue receives: every sale with its commission, VAT on commission
 * and the maker's share, the totals, the VAT a registered maker owes and reclaims, the payments
 * received and any difference explained, and the balance due with its date. VAT figures carry the
 * caution that they are guidance (docs/cautions.md).
 */
export async function renderStatement(data: StatementDocumentData): Promise<Buffer> {
  checkTotals(data);
  const { locale } = data;
  const money = (m: Money) => formatMoney(m, locale);
  const doc = createDocument({
    title: `${documentName} ${data.reference}`,
    author: data.studio.name,
    subject: `${data.title}: ${data.studio.name} and ${data.venue.name}`,
    issuedOn: data.issuedOn,
    fileId: fileIdentifier('statement', data),
  });

  titleBlock(doc, `${documentName} · ${data.stateWords}`, data);
  partiesBlock(doc, data);
  place(
    doc,
    columns(
      [
        figure('Sales', money(data.totals.sales)),
        figure('Due to the maker', money(data.totals.makerShare)),
        figure('Paid', money(data.paid)),
        figure('Balance due', money(data.balance)),
        figure('Due by', data.dueDate ? formatDate(data.dueDate, locale) : '—'),
      ],
      12,
    ),
    18,
  );

  sectionHeading(doc, `Sales (${data.lines.length})`, 90);
  drawTable(doc, {
    columns: [
      { header: 'Sold', width: 58 },
      { header: 'Piece', width: 150 },
      { header: 'Price paid', width: 62, align: 'right' },
      { header: 'Commission', width: 62, align: 'right' },
      { header: 'VAT on commission', width: 62, align: 'right' },
      { header: 'Maker’s share', width: 68, align: 'right' },
    ],
    rows: [
      ...data.lines.map((line) => ({
        cells: [
          text(formatDate(line.soldOn, locale), type.cellFigure),
          stack(
            [
              text(line.title, type.cellStrong),
              text(`${line.stockNumber} · ${line.consignmentReference}`, type.cellQuiet),
            ],
            1,
          ),
          moneyCell(line.salePrice, locale),
          moneyCell(line.commission, locale),
          moneyCell(line.vatOnCommission, locale),
          moneyCell(line.makerShare, locale),
        ],
      })),
      {
        total: true,
        keepWithPrevious: true,
        cells: [
          nothing,
          text('Total', type.cellStrong),
          moneyCell(data.totals.sales, locale, true),
          moneyCell(data.totals.commission, locale, true),
          moneyCell(data.totals.vatOnCommission, locale, true),
          moneyCell(data.totals.makerShare, locale, true),
        ],
      },
    ],
  });
  doc.y += 12;

  if (data.makerVatRegistered) {
    sectionHeading(doc, 'VAT');
    place(
      doc,
      text(
        `Output VAT in the sales, owed by the maker: ${money(data.totals.makerOutputVat)}. ` +
          `VAT on the commission, which the maker may reclaim with a VAT invoice from the venue: ${money(data.totals.makerReclaimableVat)}.`,
        type.body,
      ),
      12,
    );
  }

  sectionHeading(doc, 'Payments', 60);
  const received = data.payments.map((p) => ({
    cells: [
      text(p.receivedOn ? formatDate(p.receivedOn, locale) : '—', type.cellFigure),
      text([p.method, p.reference].filter(Boolean).join(' · '), type.cellQuiet),
      moneyCell(p.amount, locale),
    ],
  }));
  const explained = data.adjustments.map((a) => ({
    cells: [
      nothing,
      text([a.reason, a.note].filter(Boolean).join(': '), type.cellQuiet),
      moneyCell(a.amount, locale),
    ],
  }));
  drawTable(doc, {
    columns: [
      { header: 'Received', width: 80 },
      { header: 'How, or what explains a difference', width: 300 },
      { header: 'Amount', width: 82, align: 'right' },
    ],
    rows: [
      ...received,
      ...explained,
      {
        total: true,
        keepWithPrevious: received.length + explained.length > 0,
        cells: [
          nothing,
          text('Balance due', type.cellStrong),
          moneyCell(data.balance, locale, true),
        ],
      },
    ],
  });
  doc.y += 12;
  if (data.payUrl) {
    place(doc, text(`Pay online: ${data.payUrl}`, type.body), 12);
  }

  sectionHeading(doc, 'Terms', 140);
  place(doc, text(data.termsInWords.join('\n'), type.body), 12);
  place(
    doc,
    text(
      'The VAT figures are worked out by the agreed terms as guidance. Check them with HMRC or an ' +
        'accountant before relying on them for a VAT return.',
      type.small,
    ),
  );

  return finishDocument(doc, {
    studioName: data.studio.name,
    documentName,
    reference: data.reference,
    venueName: data.venue.name,
  });
}
