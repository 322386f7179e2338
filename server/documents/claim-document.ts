import { renderClaimSummary } from '@/documents/claim-summary';
import { differenceInWords, findingInWords, stageWords } from '@/shared/condition/words';
import { type ConditionCheck } from '@/shared/schemas/condition';

import { type Scope } from '../access/viewer';
import { getConsignment } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { HttpError, notFound } from '../http/http-error';
import { type PhotoStore } from '../photos/photo-store';
import { findConsignmentOfLine } from '../venue-home/venue-home.repository';
import { headingOf } from './document-heading';
import { findDocumentHeading, findingPhotoHashes } from './documents.repository';
import { jpegOf } from './documents.service';

const whereWords = {
  'in-transit': 'in transit to the venue',
  'at-venue': 'at the venue or on its way back',
} as const;
const insurerWords = { maker: 'the maker', venue: 'the venue' } as const;

const checkOf = (check: ConditionCheck) => ({
  stageWords: stageWords[check.stage],
  examinerName: check.examinerName,
  examinedOn: check.examinedOn,
  findings: check.findings.map(findingInWords),
});

/**
 * The claim summary of a piece that came back with damage it did not leave with, as a PDF, with
 * the name it is saved under; 409 when its return check found nothing new.
 */
export async function renderClaimDocument(
  db: Db,
  store: PhotoStore,
  scope: Scope,
  lineId: number,
): Promise<{ fileName: string; bytes: Buffer }> {
  const consignmentId = await findConsignmentOfLine(db, scope, lineId);
  if (consignmentId === undefined) throw notFound('That piece');
  const consignment = await getConsignment(db, scope, consignmentId);
  const line = consignment.lines.find((l) => l.id === lineId)!;
  if (!line.newDamage) {
    throw new HttpError(
      'conflict',
      `${line.stockNumber} has no new damage: its return check found nothing the dispatch check did not.`,
    );
  }
  const heading = await findDocumentHeading(db, scope, consignmentId);
  if (!heading) throw notFound('That consignment');
  const hashes = await findingPhotoHashes(db, scope, [lineId]);
  const photos = [];
  for (const d of line.newDamage.differences) {
    const hash = hashes.get(d.finding.id);
    if (hash) photos.push(await jpegOf(store.displayPath(hash), 400));
  }
  const bytes = await renderClaimSummary({
    ...headingOf(heading),
    issuedOn: line.returnCheck!.examinedOn,
    piece: { stockNumber: line.stockNumber, title: line.title, listPrice: line.listPrice },
    insuranceValue: line.newDamage.insuranceValue,
    insuredWords: insurerWords[line.newDamage.insuredBy],
    whereWords: whereWords[line.newDamage.where],
    checks: [line.dispatchCheck, line.arrivalCheck, line.returnCheck]
      .filter((c): c is ConditionCheck => c !== null)
      .map(checkOf),
    newDamage: line.newDamage.differences.map(differenceInWords),
    photos,
  });
  return { fileName: `Damage claim ${consignment.reference} ${line.stockNumber}.pdf`, bytes };
}
