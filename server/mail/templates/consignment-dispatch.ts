import { formatDate } from '@/shared/format/dates';
import { formatMoney } from '@/shared/money';
import { type Money } from '@/shared/schemas/money';

import { mailLayout } from './layout';

export type DispatchMailData = {
  studioName: string;
  venueName: string;
  contactName: string | null;
  to: string;
  reference: string;
  title: string;
  pieceCount: number;
  listTotal: Money;
  dispatchDate: string;
  openingDate: string | null;
  closingDate: string | null;
  returnDueDate: string | null;
  /** Pieces above the handling guideline weight, and that weight in kilograms. */
  heavy: { count: number; overKg: number };
  locale: string;
  /** Where the venue acknowledges arrival: an invitation to set a password, or the page itself. */
  link: { kind: 'invitation'; url: string; validDays: number } | { kind: 'page'; url: string };
};

const piecesWord = (n: number) => `${n} ${n === 1 ? 'piece' : 'pieces'}`;

function showDates(d: DispatchMailData): string | null {
  const date = (iso: string) => formatDate(iso, d.locale);
  const runs =
    d.openingDate && d.closingDate
      ? `The show runs from ${date(d.openingDate)} to ${date(d.closingDate)}.`
      : d.closingDate
        ? `The show closes on ${date(d.closingDate)}.`
        : null;
  const back = d.returnDueDate ? `Unsold pieces are due back by ${date(d.returnDueDate)}.` : null;
  return [runs, back].filter(Boolean).join(' ') || null;
}

/** To the venue's contact when a consignment is sent: what is coming, what is attached, what next. */
export function consignmentDispatchMail(d: DispatchMailData) {
  const heavy =
    d.heavy.count === 0
      ? null
      : `${d.heavy.count === 1 ? 'One piece weighs' : `${d.heavy.count} pieces weigh`} more than ${d.heavy.overKg} kg and ${d.heavy.count === 1 ? 'is' : 'are'} marked on the sheet and labels: lift with two people or a trolley, and follow your own workplace’s handling rules.`;
  const link =
    d.link.kind === 'invitation'
      ? `The button below makes your Saggar sign-in for ${d.venueName}: choose a password and you are taken to the consignment. The link works once, for ${d.link.validDays} days.`
      : `Sign in to Saggar as ${d.venueName} to acknowledge arrival.`;
  return {
    subject: `${d.studioName} has sent ${piecesWord(d.pieceCount)}: ${d.title} (${d.reference})`,
    ...mailLayout({
      heading: `${piecesWord(d.pieceCount)} on their way to ${d.venueName}`,
      paragraphs: [
        d.contactName ? `Dear ${d.contactName},` : 'Hello,',
        `${d.studioName} sent ${piecesWord(d.pieceCount)} for “${d.title}” on ${formatDate(d.dispatchDate, d.locale)}, on sale or return under consignment ${d.reference}. Together they are listed at ${formatMoney(d.listTotal, d.locale)}.`,
        'Attached are the consignment sheet (the pieces, their prices and the terms agreed), the condition report made before they left the studio, and shelf labels to print on A4.',
        ...[showDates(d), heavy].filter((p): p is string => p !== null),
        'When the pieces arrive, please unpack them, compare each with the condition report and acknowledge their arrival in Saggar, noting any damage with a photograph. Do it on the day if you can: carriers often accept damage claims only for a few days after delivery.',
        link,
      ],
      action: {
        label: d.link.kind === 'invitation' ? 'Set your password' : 'Acknowledge arrival',
        url: d.link.url,
      },
      footer: `${d.studioName} sent this through Saggar to ${d.to}, the contact for ${d.venueName} on this consignment. Questions about the pieces or the terms go to ${d.studioName}.`,
    }),
  };
}
