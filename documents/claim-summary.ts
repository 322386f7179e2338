import { formatDate } from '@/shared/format/dates';
import { formatMoney } from '@/shared/money/format';
import { type ClaimSummaryData } from '@/shared/schemas/documents';

import { columns, picture, stack, text } from './layout/boxes';
import { fileIdentifier } from './layout/identity';
import { createDocument, finishDocument } from './layout/page';
import { partiesBlock, place, sectionHeading, titleBlock } from './layout/sections';
import { type } from './layout/style';

const documentName = 'Damage claim summary';

const figure = (label: string, value: string) =>
  stack([text(label.toLocaleUpperCase('en-GB'), type.label), text(value, type.bodyStrong)], 2);

/**
 * What a maker sends an insurer or a venue when a piece comes back damaged: the piece, its
 * insurance value, who insured it where the damage most likely happened (the consignment's agreed
 * terms), the checks at dispatch, arrival and return, and the damage that is new.
 */
export async function renderClaimSummary(data: ClaimSummaryData): Promise<Buffer> {
  const { locale } = data;
  const doc = createDocument({
    title: `${documentName} ${data.reference} ${data.piece.stockNumber}`,
    author: data.studio.name,
    subject: `${data.piece.title}: ${data.studio.name} and ${data.venue.name}`,
    issuedOn: data.issuedOn,
    fileId: fileIdentifier('claim-summary', data),
  });
  titleBlock(doc, documentName, data);
  partiesBlock(doc, data);
  place(
    doc,
    columns(
      [
        figure('Piece', `${data.piece.stockNumber} ${data.piece.title}`),
        figure('List price', formatMoney(data.piece.listPrice, locale)),
        figure('Insurance value', formatMoney(data.insuranceValue, locale)),
      ],
      16,
    ),
    14,
  );
  place(
    doc,
    text(
      `The damage was not there when the piece was sent. It most likely happened ${data.whereWords}, where the agreed terms have ${data.insuredWords} insure it.`,
      type.body,
    ),
    14,
  );

  sectionHeading(doc, 'New damage');
  place(doc, text(data.newDamage.map((d) => `• ${d}`).join('\n'), type.body), 12);
  if (data.photos.length > 0) {
    place(
      doc,
      columns(
        data.photos.slice(0, 3).map((p) => picture(p, 150)),
        12,
      ),
      12,
    );
  }

  sectionHeading(doc, 'Condition checks');
  for (const check of data.checks) {
    place(
      doc,
      stack(
        [
          text(
            `${check.stageWords}: ${check.examinerName}, ${formatDate(check.examinedOn, locale)}`,
            type.bodyStrong,
          ),
          text(
            check.findings.length === 0 ? 'No faults found.' : check.findings.join('\n'),
            type.body,
          ),
        ],
        3,
      ),
      10,
    );
  }
  place(
    doc,
    text(
      'Condition grades follow the most serious finding (Collections Trust, Spectrum “Condition”). ' +
        'Whether a claim is covered depends on the policy: check with the insurer.',
      type.small,
    ),
  );

  return finishDocument(doc, {
    studioName: data.studio.name,
    documentName,
    reference: `${data.reference} ${data.piece.stockNumber}`,
    venueName: data.venue.name,
  });
}
