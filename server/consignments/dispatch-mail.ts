import { sumMoney } from '@/shared/money';
import { heavyWeightG } from '@/shared/schemas/work';

import { type Scope } from '../access/viewer';
import { type Db } from '../db/database';
import { documentFileName, type DocumentKind } from '../documents/documents.service';
import { invitationLifetimeDays } from '../invitations/invitations.service';
import { enqueueMail } from '../mail/outbox.repository';
import { consignmentDispatchMail } from '../mail/templates/consignment-dispatch';
import { type Studio } from '../studio/studio.repository';
import { type ConsignmentDetailRow, type LineRow } from './consignments.repository';

export type DispatchMail = {
  row: ConsignmentDetailRow & { venue_email: string };
  studio: Studio;
  lines: readonly LineRow[];
  dispatchDate: string;
  /** The invitation's token when the contact was invited; null when already the venue's staff. */
  invitationToken: string | null;
  appUrl: string;
};

const attached: DocumentKind[] = ['consignment-sheet', 'condition-report', 'labels'];

/**
 * Writes the dispatch e-mail to the outbox inside the dispatch's own transaction: the sheet, the
 * condition report as it stood at dispatch and the labels, attached as recipes, and the link the
 * venue acknowledges arrival through.
 */
export async function queueDispatchMail(trx: Db, scope: Scope, mail: DispatchMail) {
  const { row, studio, lines, appUrl } = mail;
  const currency = lines[0]?.currency ?? 'GBP';
  const message = consignmentDispatchMail({
    studioName: studio.name,
    venueName: row.venue_name,
    contactName: row.venue_contact_name,
    to: row.venue_email,
    reference: row.reference,
    title: row.title,
    pieceCount: lines.length,
    listTotal: sumMoney(
      lines.map((l) => ({ amount: l.list_price, currency: l.currency })),
      currency,
    ),
    dispatchDate: mail.dispatchDate,
    openingDate: row.opening_date,
    closingDate: row.closing_date,
    returnDueDate: row.return_due_date,
    heavy: {
      count: lines.filter((l) => l.weight_g !== null && l.weight_g > heavyWeightG).length,
      overKg: heavyWeightG / 1000,
    },
    locale: studio.locale,
    link: mail.invitationToken
      ? {
          kind: 'invitation',
          url: `${appUrl}/invite/${mail.invitationToken}`,
          validDays: invitationLifetimeDays,
        }
      : { kind: 'page', url: `${appUrl}/venue/consignments/${row.id}` },
  });
  return enqueueMail(trx, {
    studioId: scope.studioId,
    to: row.venue_email,
    kind: 'consignment-dispatch',
    subject: message.subject,
    text: message.text,
    html: message.html,
    attachments: attached.map((kind) => ({
      filename: documentFileName(row.reference, kind),
      contentType: 'application/pdf',
      recipe: {
        kind,
        consignmentId: row.id,
        ...(kind === 'condition-report' ? { stages: 'dispatch' } : {}),
      },
    })),
  });
}
