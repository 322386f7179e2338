import { type Statement } from '@/shared/schemas/statement';

import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { enqueueMail } from '../mail/outbox.repository';
import { statementIssuedMail } from '../mail/templates/statement-issued';
import { getStudio } from '../studio/studio.service';
import { findVenueRow } from '../venues/venues.repository';
import { statementFileName, statementPayUrl } from './statement-links';

/**
 * Writes the issued statement's e-mail to the venue in the issuing transaction, with the PDF (as a
 * recipe, made when it goes) and the link to pay online. A venue with no e-mail address gets none.
 */
export async function queueStatementMail(
  trx: Db,
  scope: Scope,
  statement: Statement,
  { appUrl }: { appUrl: string },
): Promise<number | null> {
  const venue = await findVenueRow(trx, { ...scope, venueId: null }, statement.venue.id);
  if (!venue?.email) return null;
  const studio = await getStudio(trx, scope);
  const message = statementIssuedMail({
    studioName: studio.name,
    venueName: venue.name,
    contactName: venue.contact_name,
    reference: statement.reference,
    covers: statement.consignment
      ? `${statement.consignment.reference} ${statement.consignment.title}`
      : `sales from ${statement.periodStart} to ${statement.periodEnd}`,
    saleCount: statement.lines.length,
    sales: statement.totals.sales,
    balance: statement.totals.makerShare,
    dueDate: statement.dueDate,
    locale: studio.locale,
    payUrl: statementPayUrl(appUrl, statement.id),
  });
  return enqueueMail(trx, {
    studioId: scope.studioId,
    to: venue.email,
    kind: 'statement',
    subject: message.subject,
    text: message.text,
    html: message.html,
    attachments: [
      {
        filename: statementFileName(statement.reference),
        contentType: 'application/pdf',
        recipe: { kind: 'statement', statementId: statement.id },
      },
    ],
  });
}
