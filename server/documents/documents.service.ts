import sharp from 'sharp';

import { renderConditionReport } from '@/documents/condition-report';
import { renderConsignmentSheet } from '@/documents/consignment-sheet';
import { renderLabels } from '@/documents/labels';
import { conditionDifferences } from '@/shared/condition/differences';
import { differenceInWords } from '@/shared/condition/words';
import { sumMoney } from '@/shared/money';
import { type ConditionCheck } from '@/shared/schemas/condition';
import { type DocumentCheck, type SheetLine } from '@/shared/schemas/documents';
import { heavyWeightG } from '@/shared/schemas/work';
import { termsInWords } from '@/shared/terms/terms-in-words';
import { foodUseWords } from '@/shared/works/food-use';

import { type Scope } from '../access/viewer';
import { latestChecksByLine } from '../condition/condition.service';
import { termsOf } from '../consignments/consignments.service';
import { type Db } from '../db/database';
import { notFound } from '../http/http-error';
import { type PhotoStore } from '../photos/photo-store';
import { dimensionsOf, headingOf, issuedOn, materialsOf } from './document-heading';
import {
  findDocumentHeading,
  findingPhotoHashes,
  listDocumentPieces,
} from './documents.repository';

export const documentKinds = ['consignment-sheet', 'condition-report', 'labels'] as const;
export type DocumentKind = (typeof documentKinds)[number];

const fileWords: Record<DocumentKind, string> = {
  'consignment-sheet': 'consignment sheet',
  'condition-report': 'condition report',
  labels: 'labels',
};

/** "AB-2026-03 consignment sheet.pdf": the name a document is saved and attached under. */
export const documentFileName = (reference: string, kind: DocumentKind) =>
  `${reference} ${fileWords[kind]}.pdf`;

/** A picture as a small JPEG for a page: pdfkit reads JPEG and PNG, the store keeps WebP. */
export const jpegOf = (file: string, size: number) =>
  sharp(file).resize(size, size, { fit: 'cover' }).jpeg({ quality: 82 }).toBuffer();

async function headingRow(db: Db, scope: Scope, consignmentId: number) {
  const row = await findDocumentHeading(db, scope, consignmentId);
  if (!row) throw notFound('That consignment');
  return row;
}

async function consignmentSheet(db: Db, store: PhotoStore, scope: Scope, consignmentId: number) {
  const row = await headingRow(db, scope, consignmentId);
  const terms = termsOf(row);
  const pieces = await listDocumentPieces(db, scope, consignmentId);
  const lines: SheetLine[] = [];
  for (const piece of pieces) {
    const cover = piece.photoHashes[0];
    lines.push({
      stockNumber: piece.stock_number,
      title: piece.title,
      materials: materialsOf(piece),
      dimensions: dimensionsOf(piece),
      weightG: piece.weight_g,
      listPrice: { amount: piece.list_price, currency: piece.currency },
      insuranceValue: { amount: piece.insurance_value, currency: piece.currency },
      thumbnail: cover ? await jpegOf(store.thumbnailPath(cover), 160) : null,
    });
  }
  return renderConsignmentSheet({
    ...headingOf(row),
    terms,
    termsInWords: termsInWords(terms),
    lines,
    totals: {
      listPrice: sumMoney(
        lines.map((l) => l.listPrice),
        terms.currency,
      ),
      insuranceValue: sumMoney(
        lines.map((l) => l.insuranceValue),
        terms.currency,
      ),
    },
    heavyWeightG,
  });
}

/**
 * The condition report: each piece's photos with its dispatch check and, unless only the
 * dispatch is asked for (what the dispatch e-mail carries), its arrival check beside it.
 */
async function conditionReport(
  db: Db,
  store: PhotoStore,
  scope: Scope,
  consignmentId: number,
  stages: 'dispatch' | 'latest',
) {
  const row = await headingRow(db, scope, consignmentId);
  const pieces = await listDocumentPieces(db, scope, consignmentId);
  const checks = await latestChecksByLine(
    db,
    scope,
    pieces.map((p) => p.id),
  );
  const hashes = await findingPhotoHashes(
    db,
    scope,
    pieces.map((p) => p.id),
  );
  const toDocumentCheck = async (
    check: ConditionCheck | undefined,
  ): Promise<DocumentCheck | null> => {
    if (!check) return null;
    const findings = [];
    for (const f of check.findings) {
      const hash = hashes.get(f.id);
      findings.push({
        kind: f.kind,
        grade: f.grade,
        location: f.location,
        sizeMm: f.sizeMm,
        notes: f.notes,
        photo: hash ? await jpegOf(store.displayPath(hash), 400) : null,
      });
    }
    return {
      stage: check.stage,
      examinerName: check.examinerName,
      examinedOn: check.examinedOn,
      overallGrade: check.overallGrade,
      findings,
      notes: check.notes,
    };
  };
  const documentPieces = [];
  for (const piece of pieces) {
    const pieceChecks = checks.get(piece.id) ?? {};
    const arrival = stages === 'latest' ? pieceChecks.arrival : undefined;
    const photos = [];
    for (const hash of piece.photoHashes.slice(0, 2)) {
      photos.push(await jpegOf(store.thumbnailPath(hash), 320));
    }
    documentPieces.push({
      stockNumber: piece.stock_number,
      title: piece.title,
      photos,
      dispatch: await toDocumentCheck(pieceChecks.dispatch),
      arrival: await toDocumentCheck(arrival),
      differences:
        pieceChecks.dispatch && arrival
          ? conditionDifferences(pieceChecks.dispatch.findings, arrival.findings).map(
              differenceInWords,
            )
          : [],
    });
  }
  return renderConditionReport({ ...headingOf(row), pieces: documentPieces });
}

async function labels(db: Db, scope: Scope, consignmentId: number, appUrl: string) {
  const row = await headingRow(db, scope, consignmentId);
  const pieces = await listDocumentPieces(db, scope, consignmentId);
  return renderLabels({
    studioName: row.studio_name,
    venueName: row.venue_name,
    reference: row.reference,
    issuedOn: issuedOn(row),
    locale: row.locale,
    labels: pieces.map((piece) => ({
      stockNumber: piece.stock_number,
      title: piece.title,
      materials: materialsOf(piece),
      dimensions: dimensionsOf(piece),
      price: { amount: piece.list_price, currency: piece.currency },
      careNote: piece.care_notes,
      foodUseNote: `${foodUseWords[piece.food_use]}.`,
      heavy: piece.weight_g !== null && piece.weight_g > heavyWeightG,
      qrUrl: `${appUrl}/venue/piece/${piece.id}`,
    })),
  });
}

/**
 * One of a consignment's PDFs, for whoever may see the consignment, with the file name it is
 * saved under.
 */
export async function renderConsignmentDocument(
  db: Db,
  store: PhotoStore,
  scope: Scope,
  consignmentId: number,
  kind: DocumentKind,
  options: { appUrl: string; stages?: 'dispatch' | 'latest' },
): Promise<{ fileName: string; bytes: Buffer }> {
  const row = await headingRow(db, scope, consignmentId);
  const bytes =
    kind === 'consignment-sheet'
      ? await consignmentSheet(db, store, scope, consignmentId)
      : kind === 'condition-report'
        ? await conditionReport(db, store, scope, consignmentId, options.stages ?? 'latest')
        : await labels(db, scope, consignmentId, options.appUrl);
  return { fileName: documentFileName(row.reference, kind), bytes };
}
