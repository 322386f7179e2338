import { splitSale } from '@/shared/money';
import { type OutgoingMail } from '@/shared/schemas/outbox';

import { type Scope } from '../access/viewer';
import { termsOf } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { type MailComposer } from '../mail/composers';
import { enqueueMail, findHeldMail } from '../mail/outbox.repository';
import { saleNoticeMail } from '../mail/templates/sale-notice';
import { lockStudio } from '../studio/studio.repository';
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
 * `saleNoticeHoldMs`. Joining only links the sale to the message, which is put into words once,
 * when it goes (`composeSaleNotice`): recording a sale costs the same however many are waiting.
 * A studio with no owner's address gets none.
 */
export async function noteSalesForMaker(
  trx: Db,
  scope: Scope,
  lineIds: readonly number[],
  { appUrl, now = new Date() }: { appUrl: string; now?: Date },
): Promise<void> {
  const to = await findOwnerAddress(trx, scope);
  if (!to) return;
  // Joining a message already held only shares its lock with other sales joining it; starting
  // one takes the studio's lock and looks again, so racing sales start one message, not several.
  let held = await findHeldMail(trx, scope.studioId, 'sale', to, now);
  if (!held) {
    await lockStudio(trx, scope);
    held = await findHeldMail(trx, scope.studioId, 'sale', to, now);
  }
  if (held) {
    await setSaleMail(trx, scope, lineIds, held.id);
    return;
  }
  const studio = await getStudio(trx, scope);
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
 * The sale e-mail as it goes: every sale still linked to it (a sale undone meanwhile is not),
 * or nothing when all were undone.
 */
export function composeSaleNotice({ appUrl }: { appUrl: string }): MailComposer {
  return async (db, message) => {
    if (message.studioId === null) return null;
    const scope: Scope = { studioId: message.studioId, venueId: null, userId: '', role: 'owner' };
    const lines = await listNoticeLines(db, scope, { lineIds: [], mailId: message.id });
    if (lines.length === 0) return null;
    const studio = await getStudio(db, scope);
    return noticeMail(scope, message.to, lines, studio, appUrl);
  };
}
