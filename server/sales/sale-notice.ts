import { splitSale } from '@/shared/money';
import { type OutgoingMail } from '@/shared/schemas/outbox';

import { type Scope } from '../access/viewer';
import { termsOf } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { enqueueMail, findHeldMail, replaceHeldMail } from '../mail/outbox.repository';
import { saleNoticeMail } from '../mail/templates/sale-notice';
import { getStudio } from '../studio/studio.service';
import {
  findOwnerAddress,
  listNoticeLines,
  type NoticeLineRow,
  setSaleMail,
} from './sale-notice.repository';

/**
 * How long the maker's sale e-mail waits for more sales before it goes: a till receipt, or a
 * busy hour at a fair, arrives as one message, and none waits longer than this.
 */
export const saleNoticeHoldMs = 2 * 60 * 1000;

const photoCid = (lineId: number) => `sale-${lineId}@saggar`;

function noticeMail(
  scope: Scope,
  to: string,
  lines: readonly NoticeLineRow[],
  studio: { name: string; locale: string },
  appUrl: string,
): OutgoingMail {
  const message = saleNoticeMail({
    studioName: studio.name,
    locale: studio.locale,
    url: `${appUrl}/consignments`,
    items: lines.map((l) => {
      const listPrice = { amount: l.list_price, currency: l.currency };
      const price = { amount: l.sale_price!, currency: l.currency };
      const split = splitSale(termsOf(l), listPrice, price);
      return {
        stockNumber: l.stock_number,
        title: l.title,
        venueName: l.venue_name,
        reference: l.reference,
        soldOn: l.sold_on!,
        price,
        listPrice,
        discountReason: l.discount_reason,
        commission: split.commission,
        vatOnCommission: split.vatOnCommission,
        makerShare: split.makerShare,
        recordedBy:
          l.sale_entered_by === 'studio'
            ? `the studio${l.seller_name ? ` (${l.seller_name})` : ''}`
            : `${l.seller_name ?? 'the venue’s staff'} at ${l.venue_name}`,
        imageCid: l.cover_photo_id === null ? null : photoCid(l.id),
      };
    }),
  });
  return {
    studioId: scope.studioId,
    to,
    kind: 'sale',
    subject: message.subject,
    text: message.text,
    html: message.html,
    // A photo for each of the first twenty pieces (the most a message carries).
    attachments: lines
      .filter((l) => l.cover_photo_id !== null)
      .slice(0, 20)
      .map((l) => ({
        filename: `${l.stock_number}.jpg`,
        contentType: 'image/jpeg',
        contentId: photoCid(l.id),
        recipe: { kind: 'work-photo', photoId: l.cover_photo_id },
      })),
  };
}

/**
 * Tells the maker of new sales, inside the transaction that records them: they join the sale
 * e-mail still held back for the owner if there is one, or start a new one held for
 * `saleNoticeHoldMs`. A studio with no owner's address gets none.
 */
export async function noteSalesForMaker(
  trx: Db,
  scope: Scope,
  lineIds: readonly number[],
  { appUrl, now = new Date() }: { appUrl: string; now?: Date },
): Promise<void> {
  const to = await findOwnerAddress(trx, scope);
  if (!to) return;
  const studio = await getStudio(trx, scope);
  const held = await findHeldMail(trx, scope.studioId, 'sale', to, now);
  if (held) {
    const lines = await listNoticeLines(trx, scope, { lineIds, mailId: held.id });
    if (await replaceHeldMail(trx, held.id, noticeMail(scope, to, lines, studio, appUrl))) {
      await setSaleMail(trx, scope, lineIds, held.id);
      return;
    }
  }
  const lines = await listNoticeLines(trx, scope, { lineIds, mailId: null });
  const mailId = await enqueueMail(
    trx,
    noticeMail(scope, to, lines, studio, appUrl),
    now,
    new Date(now.getTime() + saleNoticeHoldMs),
  );
  await setSaleMail(trx, scope, lineIds, mailId);
}

/**
 * A sale undone before its e-mail went: the held message is written again without it, or
 * dropped when it was the only one. Once the message has gone, the statement is what counts.
 */
export async function withdrawFromSaleNotice(
  trx: Db,
  scope: Scope,
  mailId: number,
  { appUrl }: { appUrl: string },
): Promise<void> {
  const to = await findOwnerAddress(trx, scope);
  if (!to) return;
  const lines = await listNoticeLines(trx, scope, { lineIds: [], mailId });
  const studio = await getStudio(trx, scope);
  await replaceHeldMail(
    trx,
    mailId,
    lines.length === 0 ? null : noticeMail(scope, to, lines, studio, appUrl),
  );
}
