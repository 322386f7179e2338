import { renderStatement } from '@/documents/statement';
import { isoDateInTimeZone } from '@/shared/money';
import { type StatementDocumentData } from '@/shared/schemas/documents';
import { type Statement } from '@/shared/schemas/statement';
import { termsInWords } from '@/shared/terms/terms-in-words';

import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { getStudio } from '../studio/studio.service';
import { findVenueRow } from '../venues/venues.repository';
import { statementFileName, statementPayUrl } from './statement-links';
import { getStatement } from './statements.service';

const stateWords: Record<Statement['state'], string> = {
  draft: 'Draft',
  issued: 'Issued',
  settled: 'Settled',
  void: 'Void',
};
const methodWords = {
  'bank-transfer': 'Bank transfer',
  cheque: 'Cheque',
  cash: 'Cash',
  online: 'Paid online',
} as const;
const adjustmentWords = {
  'unreported-sale': 'A sale not on the statement',
  'discount-not-agreed': 'A discount not agreed',
  'fee-deducted': 'A fee deducted',
  rounding: 'Rounding',
  other: 'Other',
} as const;

/** The statement as a PDF, for whoever may see it, with the name it is saved under. */
export async function renderStatementDocument(
  db: Db,
  scope: Scope,
  id: number,
  { appUrl }: { appUrl: string },
): Promise<{ fileName: string; bytes: Buffer }> {
  const statement = await getStatement(db, scope, id);
  const studio = await getStudio(db, scope);
  const venue = await findVenueRow(db, { ...scope, venueId: null }, statement.venue.id);
  if (!venue) throw notFound('That statement’s venue');
  const data: StatementDocumentData = {
    studio: { name: studio.name, address: [], email: null, vatNumber: studio.vat_number },
    venue: {
      name: venue.name,
      address: [
        venue.address_line1,
        venue.address_line2,
        [venue.town, venue.postcode].filter(Boolean).join(' '),
      ].filter((line): line is string => !!line),
      email: venue.email,
      vatNumber: venue.vat_number,
      contactName: venue.contact_name,
    },
    reference: statement.reference,
    title: statement.consignment
      ? `${statement.consignment.reference} ${statement.consignment.title}`
      : `Sales from ${statement.periodStart} to ${statement.periodEnd}`,
    dates: { dispatch: null, opening: null, closing: null, returnDue: null },
    issuedOn: statement.issuedAt?.slice(0, 10) ?? isoDateInTimeZone(new Date(), studio.time_zone),
    locale: studio.locale,
    stateWords: stateWords[statement.state],
    termsInWords: termsInWords(statement.terms),
    makerVatRegistered: statement.terms.makerVatRegistered,
    lines: statement.lines,
    totals: statement.totals,
    payments: statement.payments.map((p) => ({
      receivedOn: p.receivedOn,
      method: methodWords[p.method],
      reference: p.reference,
      amount: p.amount,
    })),
    adjustments: statement.adjustments.map((a) => ({
      reason: adjustmentWords[a.kind],
      note: a.note,
      amount: { ...a.amount, amount: -a.amount.amount },
    })),
    paid: statement.paid,
    balance: statement.balance,
    dueDate: statement.dueDate,
    payUrl:
      statement.state === 'issued' && statement.balance.amount > 0
        ? statementPayUrl(appUrl, id)
        : null,
  };
  return { fileName: statementFileName(statement.reference), bytes: await renderStatement(data) };
}
