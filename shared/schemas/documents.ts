import { type ConditionGrade, type FindingGrade, type FindingKind } from './condition';
import { type Money } from './money';
import { type Terms } from './terms';

/**
 * What each PDF renderer (documents/) is given: plain data, worked out beforehand by the server,
 * so a renderer does no database or HTTP work and the same data always makes the same bytes.
 * Pictures come as JPEG or PNG bytes.
 */

export type DocumentParty = {
  name: string;
  /** Address lines, town and postcode last; may be empty. */
  address: string[];
  email: string | null;
  vatNumber: string | null;
};

export type DocumentHeading = {
  studio: DocumentParty;
  venue: DocumentParty & { contactName: string | null };
  reference: string;
  title: string;
  dates: {
    dispatch: string | null;
    opening: string | null;
    closing: string | null;
    returnDue: string | null;
  };
  /** The day the document describes (YYYY-MM-DD); also its PDF creation date. */
  issuedOn: string;
  locale: string;
};

export type SheetLine = {
  stockNumber: string;
  title: string;
  /** "Porcelain, celadon glaze, 1290 °C reduction" */
  materials: string;
  /** "240 × 250 × 250 mm" or "" */
  dimensions: string;
  weightG: number | null;
  listPrice: Money;
  insuranceValue: Money;
  /** Square JPEG thumbnail, or null without a photo. */
  thumbnail: Uint8Array | null;
};

/** The consignment sheet both sides sign: terms, pieces, totals, signature lines. */
export type ConsignmentSheetData = DocumentHeading & {
  terms: Terms;
  termsInWords: string[];
  lines: SheetLine[];
  totals: { listPrice: Money; insuranceValue: Money };
  /** Pieces over this weight carry a handling caution (UK HSE INDG143 guideline, 16 kg). */
  heavyWeightG: number;
};

export type DocumentFinding = {
  kind: FindingKind;
  grade: FindingGrade;
  location: string | null;
  sizeMm: number | null;
  notes: string | null;
  photo: Uint8Array | null;
};

export type DocumentCheck = {
  stage: 'dispatch' | 'arrival' | 'return' | 'claim';
  examinerName: string;
  examinedOn: string;
  overallGrade: ConditionGrade;
  findings: DocumentFinding[];
  notes: string | null;
};

/** The condition report: each piece's photos and checks, the dispatch one beside a later one. */
export type ConditionReportData = DocumentHeading & {
  pieces: {
    stockNumber: string;
    title: string;
    photos: Uint8Array[];
    dispatch: DocumentCheck | null;
    arrival: DocumentCheck | null;
    /** Findings of the arrival check that the dispatch check did not have, in words. */
    differences: string[];
  }[];
};

export type LabelData = {
  stockNumber: string;
  title: string;
  materials: string;
  dimensions: string;
  price: Money;
  careNote: string | null;
  /** What the maker declared, or "Decorative — not for food use." when nothing was. */
  foodUseNote: string;
  heavy: boolean;
  /** The address the QR code opens: this piece on the venue side. */
  qrUrl: string;
};

/** Shelf labels on A4 sheets. */
export type LabelsData = {
  studioName: string;
  venueName: string;
  reference: string;
  issuedOn: string;
  locale: string;
  labels: LabelData[];
};

export type StatementDocumentLine = {
  consignmentReference: string;
  stockNumber: string;
  title: string;
  soldOn: string;
  salePrice: Money;
  commission: Money;
  vatOnCommission: Money;
  makerShare: Money;
};

/** A statement of account: the sales, their split, the payments, and the balance due. */
export type StatementDocumentData = DocumentHeading & {
  /** "Draft", "Issued", "Settled". */
  stateWords: string;
  termsInWords: string[];
  makerVatRegistered: boolean;
  lines: StatementDocumentLine[];
  totals: {
    sales: Money;
    commission: Money;
    vatOnCommission: Money;
    makerShare: Money;
    makerOutputVat: Money;
    makerReclaimableVat: Money;
  };
  payments: {
    receivedOn: string | null;
    method: string;
    reference: string | null;
    amount: Money;
  }[];
  adjustments: { reason: string; note: string | null; amount: Money }[];
  paid: Money;
  balance: Money;
  dueDate: string | null;
  /** Where the venue pays online, printed under the balance; null when settled. */
  payUrl: string | null;
};

/** One stage's check as a claim summary lists it: who, when, and each finding in words. */
export type ClaimCheck = {
  stageWords: string;
  examinerName: string;
  examinedOn: string;
  findings: string[];
};

/** A damage claim's summary: the piece, its value, who insured it where, and what changed. */
export type ClaimSummaryData = DocumentHeading & {
  piece: { stockNumber: string; title: string; listPrice: Money };
  insuranceValue: Money;
  /** "the venue, on its premises" or "the maker, in transit". */
  insuredWords: string;
  whereWords: string;
  checks: ClaimCheck[];
  newDamage: string[];
  photos: Uint8Array[];
};
